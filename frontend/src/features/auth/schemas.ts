import * as yup from 'yup';

export const PASSWORD_MIN_LENGTH = 8;

export const loginSchema = yup.object({
  email: yup.string().trim().email('Enter a valid e-mail address').required('Enter your e-mail address'),
  password: yup.string().required('Enter your password'),
});

export const registerSchema = yup.object({
  name: yup.string().trim().max(120, 'At most 120 characters').required('Enter your name'),
  email: yup.string().trim().email('Enter a valid e-mail address').required('Enter your e-mail address'),
  password: yup
    .string()
    .min(PASSWORD_MIN_LENGTH, `At least ${PASSWORD_MIN_LENGTH} characters`)
    .required('Choose a password'),
});

export type LoginValues = yup.InferType<typeof loginSchema>;
export type RegisterValues = yup.InferType<typeof registerSchema>;
