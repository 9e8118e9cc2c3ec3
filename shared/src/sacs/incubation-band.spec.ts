import { describe, expect, it } from 'vitest';
import { DEFAULT_INCUBATION_BAND, bandProblem, outsideRange } from './incubation-band.js';

describe('incubation band', () => {
  // docs/trade-facts.md §4 (from memory): 24–28 °C, relative humidity about 70–85 %.
  it('defaults to the usual artificial incubation band', () => {
    expect(DEFAULT_INCUBATION_BAND).toEqual({ temperatureC: { min: 24, max: 28 }, humidityPercent: { min: 70, max: 85 } });
  });

  it('flags a reading below or above the band and keeps the ends inside', () => {
    const t = DEFAULT_INCUBATION_BAND.temperatureC;
    expect(outsideRange(23.9, t)).toBe('below');
    expect(outsideRange(24, t)).toBeNull();
    expect(outsideRange(28, t)).toBeNull();
    expect(outsideRange(28.1, t)).toBe('above');
    // §4: "at 100% humidity … a sac attracts mould": a saturated reading is above the band.
    expect(outsideRange(100, DEFAULT_INCUBATION_BAND.humidityPercent)).toBe('above');
  });

  it('refuses a band the readings themselves could not hold', () => {
    expect(bandProblem('temperature', { min: 24, max: 28 })).toBeNull();
    expect(bandProblem('temperature', { min: 28, max: 24 })?.message).toMatch(/must be below/);
    expect(bandProblem('temperature', { min: 26, max: 26 })?.message).toMatch(/must be below/);
    expect(bandProblem('temperature', { min: 24, max: 80 })?.message).toMatch(/between 5 and 45 °C; 80/);
    expect(bandProblem('humidity', { min: -5, max: 80 })).toMatchObject({
      key: 'rule.band.humidityOutside',
      message: expect.stringMatching(/between 0 and 100 %; -5/),
    });
    expect(bandProblem('humidity', { min: 60, max: Number.NaN })?.message).toMatch(/outside/);
  });
});
