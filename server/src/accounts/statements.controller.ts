import { Controller, Get, Header, Param, ParseUUIDPipe, Post, Res } from '@nestjs/common';
import type { Response } from 'express';
import type { StatementResponse } from '@broodsilk/shared';
import { CurrentProject, ProjectRoles } from '../projects/project-roles.decorator';
import type { ProjectAccess } from '../projects/project-access.service';
import { StatementsService } from './statements.service';

const send = (res: Response, type: string, f: { filename: string; body: string | Buffer }) => res.type(type).attachment(f.filename).send(f.body);

@Controller('projects/:projectId/statements')
export class StatementsController {
  constructor(private readonly statements: StatementsService) {}

  @Get(':memberId.csv')
  @ProjectRoles('owner', 'partner')
  @Header('Cache-Control', 'no-store')
  async csv(@CurrentProject() a: ProjectAccess, @Param('memberId', ParseUUIDPipe) id: string, @Res() res: Response): Promise<void> {
    send(res, 'text/csv; charset=utf-8', await this.statements.csv(a, id));
  }

  @Get(':memberId.pdf')
  @ProjectRoles('owner', 'partner')
  @Header('Cache-Control', 'no-store')
  async pdf(@CurrentProject() a: ProjectAccess, @Param('memberId', ParseUUIDPipe) id: string, @Res() res: Response): Promise<void> {
    send(res, 'application/pdf', await this.statements.pdf(a, id));
  }

  @Get(':memberId')
  @ProjectRoles('owner', 'partner')
  get(@CurrentProject() a: ProjectAccess, @Param('memberId', ParseUUIDPipe) id: string): Promise<StatementResponse> {
    return this.statements.statement(a, id);
  }

  @Post(':memberId/email')
  @ProjectRoles('owner', 'partner')
  email(@CurrentProject() a: ProjectAccess, @Param('memberId', ParseUUIDPipe) id: string): Promise<{ sentTo: string }> {
    return this.statements.email(a, id);
  }
}
