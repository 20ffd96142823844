// The storm generator reaches the sizes the property tests claim: with an
// explicit size, storms of up to N bars do get near N bars (fast-check's
// default size kept them at about a dozen).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { stormArb } from './arbitraries';

describe('stormArb', () => {
  it.each([40, 300])('with at most %i bars reaches that many, and gives long storms often', (max) => {
    const lengths = fc.sample(stormArb(max), { numRuns: 200, seed: 7 }).map((s) => s.depthsMm.length);
    expect(Math.max(...lengths)).toBeGreaterThanOrEqual(0.9 * max);
    expect(Math.min(...lengths)).toBeGreaterThanOrEqual(1);
    expect(lengths.filter((n) => n > max / 2).length).toBeGreaterThanOrEqual(40);
  });

  it('gives storms of hundreds of bars by default', () => {
    const lengths = fc.sample(stormArb(), { numRuns: 100, seed: 8 }).map((s) => s.depthsMm.length);
    expect(Math.max(...lengths)).toBeGreaterThanOrEqual(200);
  });
});
