import { Body, Controller, Get, HttpCode, Param, ParseIntPipe, Post } from '@nestjs/common';
import type { TermsListResponse, TermsVersionResponse } from '@broodsilk/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { CurrentProject, ProjectRoles } from './project-roles.decorator';
import type { AuthUser } from '../common/auth-user';
import type { ProjectAccess } from './project-access.service';
import { TermsService } from './terms.service';
import { ProposeTermsDto } from './dto/propose-terms.dto';
import { AcceptTermsDto } from './dto/accept-terms.dto';

/** Caretakers get a 403 here: the terms carry the money. */
@Controller('projects/:projectId/terms')
export class TermsController {
  constructor(private readonly terms: TermsService) {}

  @Get()
  @ProjectRoles('owner', 'partner')
  list(@CurrentProject() access: ProjectAccess): Promise<TermsListResponse> {
    return this.terms.list(access);
  }

  @Post()
  @ProjectRoles('owner')
  propose(@CurrentUser() user: AuthUser, @CurrentProject() access: ProjectAccess, @Body() dto: ProposeTermsDto): Promise<TermsVersionResponse> {
    return this.terms.propose(user, access, dto);
  }

  @Post(':version/accept')
  @HttpCode(200)
  @ProjectRoles('owner', 'partner')
  accept(
    @CurrentUser() user: AuthUser,
    @CurrentProject() access: ProjectAccess,
    @Param('version', new ParseIntPipe({ errorHttpStatusCode: 404 })) version: number,
    @Body() dto: AcceptTermsDto,
  ): Promise<TermsVersionResponse> {
    return this.terms.accept(user, access, version, dto);
  }
}
