export { SignInForm } from './components/sign-in-form';
export { RegisterForm } from './components/register-form';
export { currentUserQueryOptions, authKeys } from './queries';
export { useLogout } from './mutations';
