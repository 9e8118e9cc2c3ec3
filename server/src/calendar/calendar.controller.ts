import { Controller, Get, Header, HttpCode, Param, Post, StreamableFile } from '@nestjs/common';
import type { CalendarFeedResponse } from '@broodsilk/shared';
import { Public } from '../common/decorators/public.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { AuthUser } from '../common/auth-user';
import { CalendarService } from './calendar.service';

@Controller('calendar')
export class CalendarController {
  constructor(private readonly calendar: CalendarService) {}

  @Get('feed')
  feed(@CurrentUser() user: AuthUser): Promise<CalendarFeedResponse> {
    return this.calendar.current(user);
  }

  @Post('feed/rotate')
  @HttpCode(200)
  rotate(@CurrentUser() user: AuthUser): Promise<CalendarFeedResponse> {
    return this.calendar.rotate(user);
  }

  /** Phone calendars cannot sign in: the token in the URL is the secret. */
  @Get(':token.ics')
  @Public()
  @Header('Cache-Control', 'private, no-store')
  ics(@Param('token') token: string): Promise<StreamableFile> {
    return this.calendar.file(token);
  }
}
