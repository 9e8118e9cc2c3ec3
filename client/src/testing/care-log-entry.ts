import type { CareLogEntryResponse } from '@broodsilk/shared';

/** A care-log entry of sac `s1` as the server sends it; tests name only what they look at. */
export function testCareLogEntry(over: Partial<CareLogEntryResponse> & Pick<CareLogEntryResponse, 'id' | 'kind' | 'at'>): CareLogEntryResponse {
  return {
    sacId: 's1',
    author: { id: 'u', name: 'Ines' },
    temperatureC: null,
    entered: null,
    humidityPercent: null,
    outsideBand: null,
    stage: null,
    text: null,
    strikes: null,
    struck: null,
    createdAt: over.at,
    ...over,
  };
}
