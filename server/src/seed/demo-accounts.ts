import type { AccountRole } from '@broodsilk/shared';

/** Demo accounts exist only when the demo is seeded; all share one password. */
export const DEMO_PASSWORD = 'broodsilk-demo';

export interface DemoAccount {
  key: 'keeper' | 'partner' | 'caretaker' | 'admin';
  email: string;
  displayName: string;
  role: AccountRole;
  timeZone: string;
  temperatureUnit: 'C' | 'F';
}

// An invented breeding room: Mira runs it, Tomasz lends males, Ines rolls the eggs.
export const DEMO_ACCOUNTS: DemoAccount[] = [
  { key: 'keeper', email: 'keeper@broodsilk.test', displayName: 'Mira Okonkwo', role: 'keeper', timeZone: 'Europe/Berlin', temperatureUnit: 'C' },
  { key: 'partner', email: 'partner@broodsilk.test', displayName: 'Tomasz Wierzba', role: 'keeper', timeZone: 'America/Chicago', temperatureUnit: 'F' },
  { key: 'caretaker', email: 'caretaker@broodsilk.test', displayName: 'Ines Carvalho', role: 'keeper', timeZone: 'Europe/Lisbon', temperatureUnit: 'C' },
  { key: 'admin', email: 'admin@broodsilk.test', displayName: 'Broodsilk Admin', role: 'admin', timeZone: 'UTC', temperatureUnit: 'C' },
];
