import { createParamDecorator, ExecutionContext } from '@nestjs/common';
import type { SiteRole } from '../permissions';

/** What the JWT strategy puts on the request once the token is checked. */
export interface AuthenticatedUser {
  id: number;
  email: string;
  siteRole: SiteRole;
}

export const CurrentUser = createParamDecorator(
  (_data: unknown, context: ExecutionContext): AuthenticatedUser => context.switchToHttp().getRequest().user,
);
