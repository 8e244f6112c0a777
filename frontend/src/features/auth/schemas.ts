import { PASSWORD_RULES, passwordRuleProblem } from '@thermbay/engine/vocabulary';
import * as yup from 'yup';

export const PASSWORD_MIN_LENGTH = PASSWORD_RULES.minLength;
export const PASSWORD_HELP = `At least ${PASSWORD_RULES.minLength} characters, not your e-mail address, not a common password`;

/** A new password: the shared rules here; the server adds the common-password list and says why. */
const newPassword = (emailField?: string) =>
  yup
    .string()
    .required('Choose a password')
    .test('password-rules', function check(value) {
      const email = emailField ? (this.parent as Record<string, unknown>)[emailField] : undefined;
      const problem = passwordRuleProblem(value ?? '', typeof email === 'string' ? email : undefined);
      return problem ? this.createError({ message: problem }) : true;
    });

export const loginSchema = yup.object({
  email: yup.string().trim().email('Enter a valid e-mail address').required('Enter your e-mail address'),
  password: yup.string().required('Enter your password'),
});

export const registerSchema = yup.object({
  name: yup.string().trim().max(120, 'At most 120 characters').required('Enter your name'),
  email: yup.string().trim().email('Enter a valid e-mail address').required('Enter your e-mail address'),
  password: newPassword('email'),
});

export const changePasswordSchema = yup.object({
  currentPassword: yup.string().required('Enter your current password'),
  newPassword: newPassword(),
});

export const forgotPasswordSchema = yup.object({
  email: yup.string().trim().email('Enter a valid e-mail address').required('Enter your e-mail address'),
});

export const resetPasswordSchema = yup.object({
  newPassword: newPassword(),
  repeat: yup
    .string()
    .required('Repeat the new password')
    .oneOf([yup.ref('newPassword')], 'The two passwords differ'),
});

export type LoginValues = yup.InferType<typeof loginSchema>;
export type RegisterValues = yup.InferType<typeof registerSchema>;
export type ChangePasswordValues = yup.InferType<typeof changePasswordSchema>;
export type ForgotPasswordValues = yup.InferType<typeof forgotPasswordSchema>;
export type ResetPasswordValues = yup.InferType<typeof resetPasswordSchema>;
