import { SetMetadata } from '@nestjs/common';
import type { SiteRole } from '../permissions';

export const SITE_ROLES_KEY = 'siteRoles';
/** Restricts a route to users with one of these site roles (farm roles are checked per farm). */
export const SiteRoles = (...roles: SiteRole[]) => SetMetadata(SITE_ROLES_KEY, roles);
