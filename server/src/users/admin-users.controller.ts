import { Controller, DefaultValuePipe, Get, ParseIntPipe, Query } from '@nestjs/common';
import type { AdminUserRow, Paged } from '@broodsilk/shared';
import { Roles } from '../common/decorators/roles.decorator';
import { UsersService } from './users.service';

@Roles('admin')
@Controller('admin/users')
export class AdminUsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  list(
    @Query('limit', new DefaultValuePipe(100), ParseIntPipe) limit: number,
    @Query('offset', new DefaultValuePipe(0), ParseIntPipe) offset: number,
  ): Promise<Paged<AdminUserRow>> {
    return this.users.listForAdmin(Math.min(Math.max(limit, 1), 500), Math.max(offset, 0));
  }
}
