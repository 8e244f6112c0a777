export { MembersSection } from './components/members-section';
export { MembersTable } from './components/members-table';
export { farmMembersQueryOptions, memberKeys } from './queries';
export { memberErrorMessage } from './member-errors';
