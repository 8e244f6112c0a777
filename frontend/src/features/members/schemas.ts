import * as yup from 'yup';
import type { FarmRole } from '../../api/types';

export const FARM_ROLES: readonly FarmRole[] = ['owner', 'grower', 'adviser', 'viewer'];

export const ROLE_LABELS: Record<FarmRole, string> = {
  owner: 'Owner',
  grower: 'Grower',
  adviser: 'Adviser',
  viewer: 'Viewer',
};

/** What each role may do, in the words the members table shows. */
export const ROLE_DESCRIPTIONS: Record<FarmRole, string> = {
  owner: 'everything, including members and deleting the farm',
  grower: 'edits houses, climate, logs and prices; runs estimates',
  adviser: 'reads the farm, runs estimates, writes reports',
  viewer: 'reads the farm',
};

/** Roles an invitation can carry; ownership is given on the members table once they have joined. */
export const INVITABLE_ROLES = ['grower', 'adviser', 'viewer'] as const;
export type InvitableRole = (typeof INVITABLE_ROLES)[number];

export interface InviteFormValues {
  email: string;
  role: InvitableRole;
}

export const inviteSchema = yup.object({
  email: yup.string().trim().email('Enter a valid e-mail address').required('Enter their e-mail address'),
  role: yup
    .mixed<InvitableRole>()
    .oneOf([...INVITABLE_ROLES], 'Choose a role')
    .required('Choose a role'),
});
