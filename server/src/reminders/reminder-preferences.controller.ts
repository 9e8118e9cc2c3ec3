import { Body, Controller, Get, Patch } from '@nestjs/common';
import type { ReminderPreferences } from '@broodsilk/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { AuthUser } from '../common/auth-user';
import { ReminderPreferencesService } from './reminder-preferences.service';
import { UpdateReminderPreferencesDto } from './dto/update-reminder-preferences.dto';

/** One's own reminder choices (no one else's: the route takes no user). */
@Controller('reminder-preferences')
export class ReminderPreferencesController {
  constructor(private readonly preferences: ReminderPreferencesService) {}

  @Get()
  get(@CurrentUser() user: AuthUser): Promise<ReminderPreferences> {
    return this.preferences.get(user);
  }

  @Patch()
  update(@CurrentUser() user: AuthUser, @Body() dto: UpdateReminderPreferencesDto): Promise<ReminderPreferences> {
    return this.preferences.update(user, dto);
  }
}
