import type { CareLogEntryResponse, SacResponse } from '@broodsilk/shared';
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

const KIND_WORDS: Record<SacLogEntry['kind'], string> = {
  roll: 'Roll',
  temperature: 'Temperature',
  humidity: 'Humidity',
  check: 'Check',
  stage: 'Stage change',
  note: 'Note',
  strike: 'Correction',
};

export function careLogSummary(e: SacLogEntry, layDate: string): string {
  const what =
    e.kind === 'temperature'
      ? `Temperature ${e.temperatureC!.toFixed(1)} °C`
      : e.kind === 'humidity'
        ? `Humidity ${e.humidityPercent} %`
        : e.kind === 'stage'
          ? `Stage now ${e.stage}`
          : e.kind === 'strike'
            ? `Entry struck${e.text ? `: ${e.text}` : ''}`
            : KIND_WORDS[e.kind];
  return `${what} (sac laid ${layDate}).`;
}
