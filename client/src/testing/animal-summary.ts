import type { AnimalSummary } from '@broodsilk/shared';

/** A mature female of the viewer's own, with `over` changed. */
export const animalSummary = (over: Partial<AnimalSummary>): AnimalSummary => ({
  id: 'a',
  label: 'A',
  species: { id: 's', scientificName: 'Poecilotheria regalis', group: 'ow-arboreal', urticatingHairs: false, venom: 'medically-significant' },
  sex: 'female',
  maturity: 'mature',
  maturedOn: null,
  status: 'active',
  statusOn: null,
  custody: 'with-owner',
  custodyParty: null,
  dueBackOn: null,
  enclosure: null,
  lastMoltOn: null,
  createdAt: '2026-01-01T00:00:00Z',
  heldBy: null,
  lender: null,
  ...over,
});
