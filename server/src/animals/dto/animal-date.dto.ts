import type { AnimalDateRequest } from '@broodsilk/shared';
import { IsCalendarDate } from '../../common/validators/is-calendar-date.validator';
import { sentence } from '../../common/filters/validation-exception.factory';

export class AnimalDateDto implements AnimalDateRequest {
  @IsCalendarDate(sentence('dto.animal.date'))
  on!: string;
}
