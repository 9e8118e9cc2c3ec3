import type { AnimalDateRequest } from '@broodsilk/shared';
import { IsCalendarDate } from '../../common/validators/is-calendar-date.validator';

export class AnimalDateDto implements AnimalDateRequest {
  @IsCalendarDate({ message: 'The date must be a date written YYYY-MM-DD.' })
  on!: string;
}
