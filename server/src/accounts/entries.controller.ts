import { Body, Controller, Get, Param, Post, Query } from '@nestjs/common';
import type { HandOverFormResponse, KeysetPage, LedgerEntryResponse } from '@broodsilk/shared';
import { KeysetQueryDto } from '../common/paging/keyset-cursor';
import { CurrentProject, ProjectRoles } from '../projects/project-roles.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { AuthUser } from '../common/auth-user';
import type { ProjectAccess } from '../projects/project-access.service';
import { EntriesService } from './entries.service';
import { BalancesService } from './balances.service';
import { CreateEntryDto } from './dto/create-entry.dto';
import { ConfirmEntryDto } from './dto/confirm-entry.dto';
import { RecordIdPipe } from '../common/pipes/record-id.pipe';

/** The ledger is append-only: there is no PATCH or DELETE here on purpose. */
@Controller('projects/:projectId/entries')
export class EntriesController {
  constructor(
    private readonly entries: EntriesService,
    private readonly balances: BalancesService,
  ) {}

  @Get()
  @ProjectRoles('owner', 'partner')
  list(@CurrentProject() a: ProjectAccess, @Query() page: KeysetQueryDto): Promise<KeysetPage<LedgerEntryResponse>> {
    return this.entries.list(a, page);
  }

  @Get('hand-over-form')
  @ProjectRoles('owner', 'partner')
  form(@CurrentProject() a: ProjectAccess): Promise<HandOverFormResponse> {
    return this.balances.handOverForm(a);
  }

  @Post()
  @ProjectRoles('owner', 'partner')
  create(@CurrentProject() a: ProjectAccess, @CurrentUser() u: AuthUser, @Body() dto: CreateEntryDto): Promise<LedgerEntryResponse> {
    return this.entries.create(a, u, dto);
  }

  @Post(':entryId/confirm')
  @ProjectRoles('owner', 'partner')
  confirm(
    @CurrentProject() a: ProjectAccess,
    @CurrentUser() u: AuthUser,
    @Param('entryId', RecordIdPipe) id: string,
    @Body() dto: ConfirmEntryDto,
  ): Promise<LedgerEntryResponse> {
    return this.entries.confirm(a, u, id, dto);
  }
}
