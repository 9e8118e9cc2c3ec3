import { Controller, Get, Header, HttpCode, Post, Req, UploadedFile, UseInterceptors } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import type { Request } from 'express';
import type { ImportResult } from '@broodsilk/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { AuthUser } from '../common/auth-user';
import { AnimalsCsvService } from './animals-csv.service';
import { CSV_MAX_BYTES } from './animals-csv.columns';
import { csvText } from './csv-text';
import { PerUserLimit } from '../common/per-user-limit/per-user-limit';
import { readerLanguage } from '../common/filters/reader-language';

/** Registered before AnimalsController so `export.csv` is not taken for an animal id. */
/** Each import is checked row by row against the catalogue; this many per keeper per hour covers fixing and retrying a file. */
export const CSV_IMPORTS_PER_HOUR = 20;

@Controller('animals')
export class AnimalsCsvController {
  constructor(private readonly csv: AnimalsCsvService) {}

  @Get('export.csv')
  @Header('Content-Type', 'text/csv; charset=utf-8; header=present')
  @Header('Content-Disposition', 'attachment; filename="broodsilk-animals.csv"')
  export(@CurrentUser() user: AuthUser): Promise<string> {
    return this.csv.export(user);
  }

  @Post('import')
  @HttpCode(201)
  @PerUserLimit({ what: 'csvImports', limit: CSV_IMPORTS_PER_HOUR, windowMinutes: 60 })
  @UseInterceptors(FileInterceptor('file', { limits: { fileSize: CSV_MAX_BYTES, files: 1 } }))
  async import(@CurrentUser() user: AuthUser, @Req() req: Request, @UploadedFile() file?: { buffer?: Buffer }): Promise<ImportResult> {
    // Each line's problem is said here in the reader's language; the filter says the summary.
    return this.csv.import(user, await csvText(req, file), readerLanguage(req));
  }
}
