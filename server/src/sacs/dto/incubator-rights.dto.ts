import { IsBoolean } from 'class-validator';
import type { IncubatorRightsRequest } from '@broodsilk/shared';

export class IncubatorRightsDto implements IncubatorRightsRequest {
  @IsBoolean()
  caretakersMayPullAndOpen!: boolean;
}
