import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { AdminUpdateUserDto, UpdateMeDto, UserDto } from './dto/user.dto';
import { User } from './models/user.model';

export function toUserDto(user: User): UserDto {
  return { id: user.id, email: user.email, name: user.name, siteRole: user.siteRole, unitSystem: user.unitSystem };
}

export function normaliseEmail(email: string): string {
  return email.trim().toLowerCase();
}

@Injectable()
export class UsersService {
  constructor(@InjectModel(User) private readonly users: typeof User) {}

  findByEmail(email: string): Promise<User | null> {
    return this.users.findOne({ where: { email: normaliseEmail(email) } });
  }

  async findById(id: number): Promise<User> {
    const user = await this.users.findByPk(id);
    if (!user) throw new NotFoundException('No such user');
    return user;
  }

  async list(): Promise<UserDto[]> {
    return (await this.users.findAll({ order: [['email', 'ASC']] })).map(toUserDto);
  }

  async updateMe(id: number, changes: UpdateMeDto): Promise<UserDto> {
    const user = await this.findById(id);
    await user.update(changes);
    return toUserDto(user);
  }

  async adminUpdate(actorId: number, id: number, changes: AdminUpdateUserDto): Promise<UserDto> {
    const user = await this.findById(id);
    if (actorId === id && changes.siteRole && changes.siteRole !== 'admin') {
      throw new BadRequestException('You cannot remove your own administrator role');
    }
    await user.update(changes);
    return toUserDto(user);
  }

  async remove(actorId: number, id: number): Promise<void> {
    if (actorId === id) throw new BadRequestException('You cannot delete your own account here');
    const user = await this.findById(id);
    await user.destroy();
  }
}
