import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addDays, todayIn } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { seedDemo } from '../src/seed/demo-seed';
import { seedCollection } from '../src/seed/collection.seeder';
import { Animal } from '../src/animals/animal.entity';
import { User } from '../src/users/user.entity';
import { maleClockOf } from '../src/animals/animals.mapper';
import { animalRuleErrors } from '../src/animals/animal-rules';

let t: TestApp;

beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

describe('collection demo seeder', () => {
  it('plants a collection whose males cover every clock state and whose records obey the rules', async () => {
    const now = new Date('2026-06-15T10:00:00Z');
    expect(await seedDemo(t.orm.em.fork(), [seedCollection], now)).toBe(true);

    const em = t.orm.em.fork();
    const mira = await em.findOneOrFail(User, { email: 'keeper@broodsilk.test' });
    const today = todayIn(mira.timeZone, now);
    const animals = await em.find(Animal, { recordedBy: mira }, { populate: ['species', 'ownerUser'] });
    expect(animals.length).toBeGreaterThanOrEqual(25);
    const states = new Set(animals.map((a) => maleClockOf(a, today)?.state).filter(Boolean));
    expect([...states].sort()).toEqual(['fresh', 'late', 'past-typical', 'prime']);
    expect(animals.filter((a) => a.sex === 'female' && a.maturity === 'mature').length).toBeGreaterThanOrEqual(5);
    expect(animals.some((a) => a.status === 'sold') && animals.some((a) => a.status === 'deceased')).toBe(true);

    const loan = animals.find((a) => a.custody === 'loan-in')!;
    expect(loan.ownerUser?.email).toBe('partner@broodsilk.test');
    expect(loan.dueBackOn).toBe(addDays(today, 45));

    // every planted record passes the same rules the routes apply
    for (const a of animals) expect(animalRuleErrors(a, today), a.label).toEqual([]);
    expect(await em.count(Animal, { recordedBy: { email: 'partner@broodsilk.test' } })).toBeGreaterThanOrEqual(3);
  });
});
