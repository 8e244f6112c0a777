export { SignInForm } from './components/sign-in-form';
export { RegisterForm } from './components/register-form';
export { ChangePasswordForm } from './components/change-password-form';
export { ForgotPasswordForm } from './components/forgot-password-form';
export { ResetPasswordForm } from './components/reset-password-form';
export { currentUserQueryOptions } from './queries';
export { useLogout, useSignedIn } from './mutations';
export { PASSWORD_HELP } from './schemas';
