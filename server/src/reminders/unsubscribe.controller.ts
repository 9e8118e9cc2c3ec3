import { Controller, Get, HttpCode, Param, Post, Req, Res } from '@nestjs/common';
import type { Request, Response } from 'express';
import { Public } from '../common/decorators/public.decorator';
import { readerLanguage } from '../common/filters/reader-language';
import { UnsubscribeService } from './unsubscribe.service';

/** The unsubscribe links of reminder e-mails, public: GET shows a page with a button, POST stops that kind's e-mails. */
@Public()
@Controller('unsubscribe')
export class UnsubscribeController {
  constructor(private readonly unsubscribe: UnsubscribeService) {}

  @Get(':token')
  async show(@Param('token') token: string, @Req() req: Request, @Res({ passthrough: true }) res: Response): Promise<string> {
    const { status, html } = await this.unsubscribe.page(token, readerLanguage(req));
    res.status(status).type('html');
    return html;
  }

  @Post(':token')
  @HttpCode(200)
  async stop(@Param('token') token: string, @Req() req: Request, @Res({ passthrough: true }) res: Response): Promise<string> {
    const html = await this.unsubscribe.stop(token, readerLanguage(req));
    res.type('html');
    return html;
  }
}
