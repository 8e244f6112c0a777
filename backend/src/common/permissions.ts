/**
 * The one map from a farm membership role to what it may do. The API's checks read it, and the
 * UI reads the same map through GET /api/permissions and each farm's `permissions` list.
 */
export const FARM_ROLES = ['owner', 'grower', 'adviser', 'viewer'] as const;
export type FarmRole = (typeof FARM_ROLES)[number];

export const PERMISSIONS = [
  'farm:read',
  'farm:update',
  'farm:delete',
  'members:manage',
  'house:read',
  'house:write',
  'alternative:write',
  'estimate:run',
  'report:write',
] as const;
export type Permission = (typeof PERMISSIONS)[number];

export const ROLE_PERMISSIONS: Record<FarmRole, readonly Permission[]> = {
  owner: PERMISSIONS,
  grower: ['farm:read', 'house:read', 'house:write', 'alternative:write', 'estimate:run'],
  adviser: ['farm:read', 'house:read', 'alternative:write', 'estimate:run', 'report:write'],
  viewer: ['farm:read', 'house:read'],
};

export function roleAllows(role: FarmRole, permission: Permission): boolean {
  return ROLE_PERMISSIONS[role].includes(permission);
}

export const SITE_ROLES = ['admin', 'user'] as const;
export type SiteRole = (typeof SITE_ROLES)[number];
