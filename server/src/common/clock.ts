import { Injectable } from '@nestjs/common';

/**
 * "Now" for sacs, the dashboard, the feed and reminders, in one injectable place so e2e tests
 * can pin an instant (a month end, a leap day) with a spy instead of waiting for the calendar.
 */
@Injectable()
export class Clock {
  now(): Date {
    return new Date();
  }
}
