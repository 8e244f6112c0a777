export { UsersTable } from './components/users-table';
export { usersListQueryOptions } from './queries';
