import { Body, Controller, Get, Param, Post, Query } from '@nestjs/common';
import type { CareLogEntryResponse, KeysetPage } from '@broodsilk/shared';
import { KeysetQueryDto } from '../common/paging/keyset-cursor';
import { AnyProjectMember, CurrentProject, ProjectFrom, ProjectRoles } from '../projects/project-roles.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { AuthUser } from '../common/auth-user';
import type { ProjectAccess } from '../projects/project-access.service';
import { CareLogService } from './care-log.service';
import { CareLogEntryDto } from './dto/care-log-entry.dto';
import { RecordIdPipe } from '../common/pipes/record-id.pipe';

/** Partners read the log; the owner and caretakers write it (docs/product.md, Roles: caretakers add log entries). */
@Controller('sacs/:id/log')
export class CareLogController {
  constructor(private readonly log: CareLogService) {}

  @Get()
  @AnyProjectMember()
  @ProjectFrom('sac')
  list(@CurrentProject() a: ProjectAccess, @Param('id', RecordIdPipe) id: string, @Query() page: KeysetQueryDto): Promise<KeysetPage<CareLogEntryResponse>> {
    return this.log.list(a, id, page);
  }

  @Post()
  @ProjectRoles('owner', 'caretaker')
  @ProjectFrom('sac')
  add(
    @CurrentProject() a: ProjectAccess,
    @CurrentUser() user: AuthUser,
    @Param('id', RecordIdPipe) id: string,
    @Body() dto: CareLogEntryDto,
  ): Promise<CareLogEntryResponse> {
    return this.log.add(a, user, id, dto);
  }
}
