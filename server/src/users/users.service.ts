import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import type { AdminUserRow, Me, Paged } from '@broodsilk/shared';
import { User } from './user.entity';
import { toAdminUserRow, toMe } from './users.mapper';
import type { UpdateProfileDto } from './dto/update-profile.dto';

@Injectable()
export class UsersService {
  constructor(private readonly em: EntityManager) {}

  async updateProfile(userId: string, dto: UpdateProfileDto): Promise<Me> {
    const user = await this.em.findOneOrFail(User, { id: userId });
    this.em.assign(user, dto);
    await this.em.flush();
    return toMe(user);
  }

  async listForAdmin(limit = 100, offset = 0): Promise<Paged<AdminUserRow>> {
    const [users, total] = await this.em.findAndCount(User, {}, { orderBy: { createdAt: 'asc' }, limit, offset });
    return { items: users.map(toAdminUserRow), total };
  }
}
