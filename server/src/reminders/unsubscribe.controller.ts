import { Controller, Get, HttpCode, Param, Post, Req, Res } from '@nestjs/common';
import type { Request, Response } from 'express';
import { DEFAULT_LANGUAGE, LANGUAGES, isLanguage, type Language } from '@broodsilk/shared';
import { Public } from '../common/decorators/public.decorator';
import { UnsubscribeService } from './unsubscribe.service';

/** The browser's language among ours by its `Accept-Language` (express's `accepts`, on `negotiator`), else English. */
function browserLanguage(req: Request): Language {
  const best = req.acceptsLanguages(...LANGUAGES);
  return isLanguage(best) ? best : DEFAULT_LANGUAGE;
}

/** The unsubscribe links of reminder e-mails, public: GET shows a page with a button, POST stops that kind's e-mails. */
@Public()
@Controller('unsubscribe')
export class UnsubscribeController {
  constructor(private readonly unsubscribe: UnsubscribeService) {}

  @Get(':token')
  async show(@Param('token') token: string, @Req() req: Request, @Res({ passthrough: true }) res: Response): Promise<string> {
    const { status, html } = await this.unsubscribe.page(token, browserLanguage(req));
    res.status(status).type('html');
    return html;
  }

  @Post(':token')
  @HttpCode(200)
  async stop(@Param('token') token: string, @Req() req: Request, @Res({ passthrough: true }) res: Response): Promise<string> {
    const html = await this.unsubscribe.stop(token, browserLanguage(req));
    res.type('html');
    return html;
  }
}
