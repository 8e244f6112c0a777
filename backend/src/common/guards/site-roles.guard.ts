import { CanActivate, ExecutionContext, ForbiddenException, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { SITE_ROLES_KEY } from '../decorators/site-roles.decorator';
import type { SiteRole } from '../permissions';

@Injectable()
export class SiteRolesGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    const roles = this.reflector.getAllAndOverride<SiteRole[]>(SITE_ROLES_KEY, [
      context.getHandler(),
      context.getClass(),
    ]);
    if (!roles || roles.length === 0) return true;
    const user = context.switchToHttp().getRequest().user;
    if (!user || !roles.includes(user.siteRole)) {
      throw new ForbiddenException('This needs a site administrator');
    }
    return true;
  }
}
