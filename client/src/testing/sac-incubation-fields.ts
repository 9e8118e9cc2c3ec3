import { DEFAULT_INCUBATION_BAND, INCUBATION_BAND_SOURCE, type SacResponse } from '@broodsilk/shared';

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
