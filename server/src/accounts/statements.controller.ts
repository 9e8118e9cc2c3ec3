import { Controller, Get, Header, Param, Post, StreamableFile } from '@nestjs/common';
import type { StatementResponse } from '@broodsilk/shared';
import { CurrentProject, ProjectRoles } from '../projects/project-roles.decorator';
import type { ProjectAccess } from '../projects/project-access.service';
import { StatementsService } from './statements.service';
import { PerUserLimit } from '../common/per-user-limit/per-user-limit';
import { RecordIdPipe } from '../common/pipes/record-id.pipe';

/** A download with its name; Nest sets the headers, so the handler stays in Nest's response flow (interceptors, filters). */
const download = (type: string, f: { filename: string; body: string | Buffer }) =>
  new StreamableFile(Buffer.isBuffer(f.body) ? f.body : Buffer.from(f.body, 'utf8'), { type, disposition: `attachment; filename="${f.filename}"` });

/** Statements e-mailed per keeper per hour: one to each party of a few projects, not a mail cannon. */
export const STATEMENT_EMAILS_PER_HOUR = 10;

@Controller('projects/:projectId/statements')
export class StatementsController {
  constructor(private readonly statements: StatementsService) {}

  @Get(':memberId.csv')
  @ProjectRoles('owner', 'partner')
  @Header('Cache-Control', 'no-store')
  async csv(@CurrentProject() a: ProjectAccess, @Param('memberId', RecordIdPipe) id: string): Promise<StreamableFile> {
    return download('text/csv; charset=utf-8', await this.statements.csv(a, id));
  }

  @Get(':memberId.pdf')
  @ProjectRoles('owner', 'partner')
  @Header('Cache-Control', 'no-store')
  async pdf(@CurrentProject() a: ProjectAccess, @Param('memberId', RecordIdPipe) id: string): Promise<StreamableFile> {
    return download('application/pdf', await this.statements.pdf(a, id));
  }

  @Get(':memberId')
  @ProjectRoles('owner', 'partner')
  get(@CurrentProject() a: ProjectAccess, @Param('memberId', RecordIdPipe) id: string): Promise<StatementResponse> {
    return this.statements.statement(a, id);
  }

  @Post(':memberId/email')
  @ProjectRoles('owner', 'partner')
  @PerUserLimit({ what: 'statementEmails', limit: STATEMENT_EMAILS_PER_HOUR, windowMinutes: 60 })
  email(@CurrentProject() a: ProjectAccess, @Param('memberId', RecordIdPipe) id: string): Promise<{ sentTo: string }> {
    return this.statements.email(a, id);
  }
}
