import { DEFAULT_INCUBATION_BAND, INCUBATION_BAND_SOURCE, outsideRange, type BandSide, type Range, type SacResponse } from '@broodsilk/shared';
import type { Sac } from './sac.entity';

const pair = (min: number | null | undefined, max: number | null | undefined): Range | null => (min != null && max != null ? { min, max } : null);

/** The band in force for a sac: its own ranges where set, else the default band. */
export function bandOf(sac: Sac): SacResponse['band'] {
  const t = pair(sac.bandTemperatureMinC, sac.bandTemperatureMaxC);
  const h = pair(sac.bandHumidityMin, sac.bandHumidityMax);
  return {
    temperatureC: t ?? DEFAULT_INCUBATION_BAND.temperatureC,
    humidityPercent: h ?? DEFAULT_INCUBATION_BAND.humidityPercent,
    origin: t || h ? 'sac' : 'default',
    source: INCUBATION_BAND_SOURCE,
  };
}

/** Which side of the sac's band a reading lies on (null inside, or for an entry that is no reading). */
export function readingSide(band: SacResponse['band'], reading: { temperatureC?: number | null; humidityPercent?: number | null }): BandSide | null {
  if (reading.temperatureC != null) return outsideRange(reading.temperatureC, band.temperatureC);
  if (reading.humidityPercent != null) return outsideRange(reading.humidityPercent, band.humidityPercent);
  return null;
}

/** The entity columns for the ranges a request gives (null: back to the default band). */
export function bandColumns(dto: { temperatureBand?: Range | null; humidityBand?: Range | null }): Partial<Sac> {
  return {
    ...(dto.temperatureBand !== undefined
      ? { bandTemperatureMinC: dto.temperatureBand?.min ?? null, bandTemperatureMaxC: dto.temperatureBand?.max ?? null }
      : {}),
    ...(dto.humidityBand !== undefined ? { bandHumidityMin: dto.humidityBand?.min ?? null, bandHumidityMax: dto.humidityBand?.max ?? null } : {}),
  };
}
