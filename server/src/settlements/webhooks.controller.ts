import { Controller, Headers, HttpCode, Post, Req, type RawBodyRequest } from '@nestjs/common';
import type { Request } from 'express';
import { Public } from '../common/decorators/public.decorator';
import { WebhookService } from './webhook.service';

/** The payment provider's webhook: no session (signature-checked instead), exempt from CSRF under /api/webhooks/. */
@Controller('webhooks')
export class WebhooksController {
  constructor(private readonly webhooks: WebhookService) {}

  @Post('payments')
  @Public()
  @HttpCode(200)
  payments(@Req() req: RawBodyRequest<Request>, @Headers('stripe-signature') signature?: string) {
    return this.webhooks.handle(req.rawBody, signature);
  }
}
