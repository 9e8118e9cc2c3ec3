import { DEFAULT_INCUBATION_BAND, INCUBATION_BAND_SOURCE, INCUBATOR_CAUTION, type SacResponse } from '@broodsilk/shared';

/** The incubation fields of a test sac as the owner sees a pulled one: the default band, no alerts, every action allowed. */
export const SAC_INCUBATION_FIELDS: Pick<
  SacResponse,
  'leftWithMother' | 'rollPastLegs' | 'rollingStopsAt' | 'container' | 'band' | 'readingAlerts' | 'inIncubator' | 'may' | 'caretakersMayPullAndOpen'
> = {
  leftWithMother: false,
  rollPastLegs: false,
  rollingStopsAt: 'eggs-with-legs',
  container: null,
  band: { ...DEFAULT_INCUBATION_BAND, origin: 'default', source: INCUBATION_BAND_SOURCE },
  readingAlerts: [],
  inIncubator: true,
  may: { edit: true, pullAndOpen: true, log: true, setIncubatorRights: true },
  caretakersMayPullAndOpen: false,
};

/** A sac pulled six days ago with a roll overdue, as its keeper sees it. */
export const PULLED_TEST_SAC: SacResponse = {
  id: 's1',
  projectId: 'p1',
  layDate: '2026-11-01',
  dayNumber: 30,
  today: '2026-12-01',
  pulled: true,
  pulledAt: '2026-11-25T07:00:00Z',
  pulledOn: '2026-11-25',
  outcome: 'in-progress',
  failureReason: null,
  pullWindow: {
    fromDay: 21,
    toDay: 45,
    origin: 'default',
    source: { kind: 'common-practice' },
    opensOn: '2026-11-22',
    closesOn: '2026-12-16',
    closingFrom: '2026-12-14',
    dayNumber: 30,
    state: 'open',
    daysUntilOpens: 0,
    daysUntilCloses: 15,
    daysPastClose: 0,
  },
  rollIntervalHours: 12,
  rollingOff: false,
  roll: { due: '2026-12-01T07:00:00Z', status: 'overdue', lastRollAt: '2026-11-30T19:00:00Z' },
  broodStage: 'eggs',
  opened: false,
  currentCount: null,
  currentCountEstimated: false,
  notes: null,
  warningReason: null,
  incubatorCaution: INCUBATOR_CAUTION,
  ...SAC_INCUBATION_FIELDS,
  createdAt: '2026-11-01T10:00:00Z',
  updatedAt: '2026-11-30T19:00:00Z',
};
