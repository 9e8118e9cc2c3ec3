import { IsBoolean } from 'class-validator';
import type { IncubatorRightsRequest } from '@broodsilk/shared';

export class IncubatorRightsDto implements IncubatorRightsRequest {
  @IsBoolean({ message: 'caretakersMayPullAndOpen must be true or false.' })
  caretakersMayPullAndOpen!: boolean;
}
