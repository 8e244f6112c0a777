import { ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { type Permission, roleAllows } from '../common/permissions';
import { Membership } from './models/membership.model';

/**
 * The single gate to a farm's data. Not a member: 404, exactly as if the farm did not exist,
 * so nothing leaks. A member whose role lacks the permission: 403.
 */
@Injectable()
export class FarmAccessService {
  constructor(@InjectModel(Membership) private readonly memberships: typeof Membership) {}

  async require(user: AuthenticatedUser, farmId: number, permission: Permission): Promise<Membership> {
    const membership = await this.memberships.findOne({ where: { farmId, userId: user.id } });
    if (!membership) throw new NotFoundException('No such farm');
    if (!roleAllows(membership.role, permission)) {
      throw new ForbiddenException(`Your role on this farm (${membership.role}) does not allow ${permission}`);
    }
    return membership;
  }
}
