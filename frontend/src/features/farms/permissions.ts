import type { Farm, Permission } from '../../api/types';

/** The UI shows edit controls only where the API's permission list for this farm allows them. */
export function farmAllows(farm: Pick<Farm, 'permissions'> | undefined, permission: Permission): boolean {
  return Boolean(farm?.permissions.includes(permission));
}
