import * as yup from 'yup';

export const siteRoleSchema = yup.mixed<'admin' | 'user'>().oneOf(['admin', 'user']).required();
