import type { AnimalDateRequest } from '@broodsilk/shared';
import { IsCalendarDate } from '../../common/validators/is-calendar-date.validator';
import { keyedBy } from '../../common/filters/validation-exception.factory';

export class AnimalDateDto implements AnimalDateRequest {
  @IsCalendarDate({ context: keyedBy('dto.animal.date') })
  on!: string;
}
