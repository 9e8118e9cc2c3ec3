import { Body, Controller, Get, Param, Post } from '@nestjs/common';
import type { KeptBackBatchResponse } from '@broodsilk/shared';
import { AnyProjectMember, CurrentProject, ProjectFrom, ProjectRoles } from '../projects/project-roles.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { AuthUser } from '../common/auth-user';
import type { ProjectAccess } from '../projects/project-access.service';
import { KeptBackService } from './kept-back.service';
import { KeptBackEndDto, KeptBackLogDto } from './dto/kept-back.dto';
import { RecordIdPipe } from '../common/pipes/record-id.pipe';

/** The eggs kept back at a sac's opening: members read; owner and caretakers roll and check; the owner ends the batch, as the opening. */
@Controller('sacs/:id/kept-back')
export class KeptBackController {
  constructor(private readonly keptBack: KeptBackService) {}

  @Get()
  @AnyProjectMember()
  @ProjectFrom('sac')
  get(@CurrentProject() a: ProjectAccess, @Param('id', RecordIdPipe) id: string): Promise<KeptBackBatchResponse> {
    return this.keptBack.get(a, id);
  }

  @Post('log')
  @ProjectRoles('owner', 'caretaker')
  @ProjectFrom('sac')
  log(
    @CurrentProject() a: ProjectAccess,
    @CurrentUser() user: AuthUser,
    @Param('id', RecordIdPipe) id: string,
    @Body() dto: KeptBackLogDto,
  ): Promise<KeptBackBatchResponse> {
    return this.keptBack.log(a, user, id, dto);
  }

  @Post('end')
  @ProjectRoles('owner')
  @ProjectFrom('sac')
  end(
    @CurrentProject() a: ProjectAccess,
    @CurrentUser() user: AuthUser,
    @Param('id', RecordIdPipe) id: string,
    @Body() dto: KeptBackEndDto,
  ): Promise<KeptBackBatchResponse> {
    return this.keptBack.end(a, user, id, dto);
  }
}
