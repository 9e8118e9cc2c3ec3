import { afterEach, describe, expect, it, vi } from 'vitest';
import type { AnimalResponse } from '@broodsilk/shared';
import { animalFormValues, toAnimalRequest } from './animal-form-values';

afterEach(() => vi.restoreAllMocks());

const blank = animalFormValues();

describe('toAnimalRequest', () => {
  it('sends typed day-first dates as ISO 8601 dates and a price in minor units (ISO 4217: EUR has 2 digits, JPY 0)', () => {
    vi.spyOn(navigator, 'language', 'get').mockReturnValue('en-GB');
    const eur = toAnimalRequest({ ...blank, speciesId: 's1', label: ' Rosa ', acquiredOn: '14/03/2025', price: '40.5', priceCurrency: 'eur' });
    expect(eur).toMatchObject({ label: 'Rosa', acquiredOn: '2025-03-14', pricePaidMinor: 4050, priceCurrency: 'EUR' });
    expect(toAnimalRequest({ ...blank, price: '4000', priceCurrency: 'JPY' }).pricePaidMinor).toBe(4000);
  });

  it('clears the fields that do not apply to the chosen shape', () => {
    const v = {
      ...blank,
      maturity: 'immature' as const,
      maturedOn: '2025-01-01',
      custody: 'with-owner' as const,
      dueBackOn: '2027-01-01',
      premoltNote: 'dark',
    };
    expect(toAnimalRequest(v)).toMatchObject({ maturedOn: null, dueBackOn: null, custodyParty: null, premoltNote: null, ownerEmail: null });
  });

  it('leaves a keeper-owner e-mail out when an edit keeps the recorded owner', () => {
    expect(toAnimalRequest({ ...blank, ownerKind: 'keeper', ownerEmail: ' ' }).ownerEmail).toBeUndefined();
  });
});

describe('animalFormValues', () => {
  it('shows saved values as text the fields keep, and round-trips to the same request', () => {
    const saved = {
      species: { id: 's1', scientificName: 'Tliltocatl vagans' },
      label: 'Rosa',
      sex: 'female',
      maturity: 'mature',
      maturedOn: '2024-06-01',
      acquiredOn: '2023-02-10',
      acquiredFrom: 'A show',
      pricePaidMinor: 4050,
      priceCurrency: 'EUR',
      owner: { kind: 'self' },
      custody: 'with-owner',
      custodyParty: null,
      dueBackOn: null,
      status: 'active',
      statusOn: null,
      enclosure: 'B2',
      notes: null,
      premoltNote: 'Off food',
    } as unknown as AnimalResponse;
    const v = animalFormValues(saved);
    expect(v).toMatchObject({ maturedOn: '2024-06-01', acquiredOn: '2023-02-10', price: '40.5', dueBackOn: '', statusOn: '' });
    expect(toAnimalRequest(v)).toMatchObject({ maturedOn: '2024-06-01', acquiredOn: '2023-02-10', pricePaidMinor: 4050, premoltNote: 'Off food' });
  });
});
