import { Controller, Get, StreamableFile } from '@nestjs/common';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { AuthUser } from '../common/auth-user';
import { PerUserLimit } from '../common/per-user-limit/per-user-limit';
import { ExportService } from './export.service';

/** A full export reads every row the keeper can see: a few an hour are plenty. */
export const EXPORTS_PER_HOUR = 6;

@Controller('export')
export class ExportController {
  constructor(private readonly exports: ExportService) {}

  /** All of the signed-in keeper's data as one zip, streamed (its length is not known in advance). */
  @Get()
  @PerUserLimit({ what: 'dataExports', limit: EXPORTS_PER_HOUR, windowMinutes: 60 })
  async download(@CurrentUser() user: AuthUser): Promise<StreamableFile> {
    const day = new Date().toISOString().slice(0, 10);
    return new StreamableFile(await this.exports.archive(user.id), {
      type: 'application/zip',
      disposition: `attachment; filename="broodsilk-export-${day}.zip"`,
    });
  }
}
