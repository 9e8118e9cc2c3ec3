import { Body, Controller, Get, Param, Post, UploadedFile, UseInterceptors } from '@nestjs/common';
import type { BroodCountResponse, BroodCountsResponse, OpeningResponse, PhotoRef } from '@broodsilk/shared';
import { AnyProjectMember, CurrentProject, ProjectFrom, ProjectRoles } from '../projects/project-roles.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { AuthUser } from '../common/auth-user';
import type { ProjectAccess } from '../projects/project-access.service';
import { ImageUploadInterceptor } from '../photos/image-upload.interceptor';
import { PhotoUploadLimit } from '../photos/photo-upload-limit';
import { OpeningService } from './opening.service';
import { BroodCountsService } from './brood-counts.service';
import { OpeningDto } from './dto/opening.dto';
import { BroodCountDto } from './dto/brood-count.dto';
import { RecordIdPipe } from '../common/pipes/record-id.pipe';

@Controller('sacs/:id')
export class BroodController {
  constructor(
    private readonly openings: OpeningService,
    private readonly counts: BroodCountsService,
  ) {}

  @Get('opening')
  @AnyProjectMember()
  @ProjectFrom('sac')
  opening(@CurrentProject() a: ProjectAccess, @Param('id', RecordIdPipe) id: string): Promise<OpeningResponse> {
    return this.openings.get(a, id);
  }

  /** Caretakers reach the service, which refuses them unless the project allows it. */
  @Post('opening')
  @ProjectRoles('owner', 'caretaker')
  @ProjectFrom('sac')
  open(
    @CurrentProject() a: ProjectAccess,
    @CurrentUser() user: AuthUser,
    @Param('id', RecordIdPipe) id: string,
    @Body() dto: OpeningDto,
  ): Promise<OpeningResponse> {
    return this.openings.open(a, user, id, dto);
  }

  @Post('opening/photos')
  @ProjectRoles('owner', 'caretaker')
  @ProjectFrom('sac')
  @PhotoUploadLimit()
  @UseInterceptors(ImageUploadInterceptor)
  photo(
    @CurrentProject() a: ProjectAccess,
    @CurrentUser() user: AuthUser,
    @Param('id', RecordIdPipe) id: string,
    @UploadedFile() file?: { buffer?: Buffer },
  ): Promise<PhotoRef> {
    return this.openings.addPhoto(a, user, id, file);
  }

  @Get('counts')
  @AnyProjectMember()
  @ProjectFrom('sac')
  listCounts(@CurrentProject() a: ProjectAccess, @Param('id', RecordIdPipe) id: string): Promise<BroodCountsResponse> {
    return this.counts.list(a, id);
  }

  @Post('counts')
  @ProjectRoles('owner', 'caretaker')
  @ProjectFrom('sac')
  addCount(
    @CurrentProject() a: ProjectAccess,
    @CurrentUser() user: AuthUser,
    @Param('id', RecordIdPipe) id: string,
    @Body() dto: BroodCountDto,
  ): Promise<BroodCountResponse> {
    return this.counts.add(a, user, id, dto);
  }
}
