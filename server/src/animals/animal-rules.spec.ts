import { describe, expect, it } from 'vitest';
import { animalRuleErrors, type AnimalState } from './animal-rules';

const base: AnimalState = { sex: 'female', maturity: 'immature', ownerKind: 'self', custody: 'with-owner', status: 'active' };
const TODAY = '2026-03-10';
const fields = (a: Partial<AnimalState>) => animalRuleErrors({ ...base, ...a }, TODAY).map((e) => e.field);

describe('animalRuleErrors', () => {
  it('accepts a plain record', () => {
    expect(animalRuleErrors(base, TODAY)).toEqual([]);
  });

  it('a mature male needs his maturing date; an immature animal has none', () => {
    expect(fields({ sex: 'male', maturity: 'mature' })).toEqual(['maturedOn']);
    expect(fields({ sex: 'male', maturity: 'mature', maturedOn: '2026-01-01' })).toEqual([]);
    expect(fields({ maturedOn: '2026-01-01' })).toEqual(['maturedOn']);
  });

  it('compares ISO 8601 dates as calendar dates: today is allowed, tomorrow is the future', () => {
    expect(fields({ acquiredOn: TODAY })).toEqual([]);
    expect(fields({ acquiredOn: '2026-03-11' })).toEqual(['acquiredOn']);
    expect(fields({ status: 'sold', statusOn: '2027-01-01' })).toEqual(['statusOn']);
  });

  it('an own animal cannot mature before it was acquired; a loaned-in one may', () => {
    const early = { sex: 'male' as const, maturity: 'mature' as const, maturedOn: '2025-12-01', acquiredOn: '2026-01-15' };
    expect(fields(early)).toEqual(['maturedOn']);
    expect(fields({ ...early, ownerKind: 'keeper', ownerEmail: 'x@example.test', custody: 'loan-in' })).toEqual([]);
  });

  it('ISO 4217: a price needs a currency the standard lists (Intl currency list)', () => {
    expect(fields({ pricePaidMinor: 100 })).toEqual(['priceCurrency']);
    expect(fields({ pricePaidMinor: 100, priceCurrency: 'EUR' })).toEqual([]);
    expect(fields({ pricePaidMinor: 100, priceCurrency: 'JPY' })).toEqual([]);
    expect(fields({ pricePaidMinor: 100, priceCurrency: 'ABC' })).toEqual(['priceCurrency']);
  });

  it('owner and custody fit together', () => {
    expect(fields({ ownerKind: 'keeper' })).toEqual(['ownerEmail']);
    expect(fields({ ownerKind: 'party' })).toEqual(['ownerName']);
    expect(fields({ custody: 'loan-in' })).toEqual(['custody']);
    expect(fields({ custody: 'loan-out' })).toEqual(['custodyParty']);
    expect(fields({ custody: 'loan-out', custodyParty: 'A friend', status: 'on-loan', dueBackOn: '2026-05-01' })).toEqual([]);
    expect(fields({ dueBackOn: '2026-05-01' })).toEqual(['dueBackOn']);
    expect(fields({ status: 'on-loan' })).toEqual(['status']);
    expect(fields({ status: 'deceased' })).toEqual(['statusOn']);
  });
});
