import * as yup from 'yup';

export const profileSchema = yup.object({
  name: yup.string().trim().max(120, 'At most 120 characters').required('Enter your name'),
  unitSystem: yup.mixed<'si' | 'us'>().oneOf(['si', 'us']).required(),
});

export type ProfileValues = yup.InferType<typeof profileSchema>;
