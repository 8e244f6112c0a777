export { MembersSection } from './components/members-section';
export { MembersTable } from './components/members-table';
export { farmMembersQueryOptions } from './queries';
export { memberErrorMessage } from './member-errors';
