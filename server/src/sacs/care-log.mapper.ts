import { broodStageLabel, formatTemperature, label, serverWordsFor, type CareLogEntryResponse, type SacResponse, type Words } from '@broodsilk/shared';
import type { SacLogEntry } from './sac-log-entry.entity';
import { readingSide } from './sac-band';

/** Needs `author` loaded; `struckBy` is the strike entry that corrects this one, if any; `band` the sac's band in force. */
export function toCareLogResponse(e: SacLogEntry, struckBy: SacLogEntry | undefined, band: SacResponse['band']): CareLogEntryResponse {
  return {
    id: e.id,
    sacId: e.sac.id,
    kind: e.kind,
    at: e.at.toISOString(),
    author: e.author ? { id: e.author.id, name: e.author.displayName } : null,
    temperatureC: e.temperatureC ?? null,
    entered: e.enteredValue != null && e.enteredUnit ? { value: e.enteredValue, unit: e.enteredUnit } : null,
    humidityPercent: e.humidityPercent ?? null,
    outsideBand: readingSide(band, e),
    stage: e.stage ?? null,
    text: e.text ?? null,
    strikes: e.strikes?.id ?? null,
    struck: struckBy ? { byEntryId: struckBy.id, reason: struckBy.text ?? null, at: struckBy.at.toISOString() } : null,
    createdAt: e.createdAt.toISOString(),
  };
}

/** The timeline sentence for a care-log entry, in the catalogue's words (stored in English; readers re-render from `data`). */
export function careLogSummary(e: SacLogEntry, layDate: string, t: Words = serverWordsFor('en')): string {
  const what =
    e.kind === 'temperature'
      ? t('text.temperatureNow', { temperature: formatTemperature(e.temperatureC!, 'C') })
      : e.kind === 'humidity'
        ? t('text.humidityNow', { percent: e.humidityPercent })
        : e.kind === 'stage'
          ? t('text.stageNow', { stage: broodStageLabel(t, e.stage!) })
          : e.kind === 'strike'
            ? e.text
              ? t('text.entryStruckBecause', { reason: e.text })
              : t('text.entryStruck')
            : label(t, 'careLogKind', e.kind);
  return t('text.ofSac', { what, layDate });
}
