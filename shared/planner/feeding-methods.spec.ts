import { FEEDING_METHODS, FeedingMethodSchema, WASTE_ALLOWANCES } from './feeding-methods';

describe('WASTE_ALLOWANCES', () => {
  it('plans on the published waste figures', () => {
    const waste = Object.fromEntries(FEEDING_METHODS.map((m) => [m, WASTE_ALLOWANCES[m].wasteFraction]));
    expect(waste).toEqual({
      'small-square-feeder': 0.05, // Grev et al. 2014 UMN: feeders 1–5 % (brief §11 [S33]; not re-checked)
      'small-square-ground': 0.13, // Grev et al. 2014 UMN (brief §11 [S33]; not re-checked)
      'round-bale-feeder': 0.1, // Martinson et al. 2012: 5–33 % across feeders; 10 % planning figure (practice)
      'round-bale-no-feeder': 0.57, // Martinson et al. 2012 — verified: "That 57 percent waste number" (Q-Racing Journal, May 2014, quoting Martinson)
      'stall-feeder': 0.01, // verified: 1.3 % in a feeder (Martinson, "Reducing hay waste" webcast, UMN 2011)
      'stall-no-feeder': 0.07, // verified: 7.3 % off the floor (same source)
    });
  });

  it('keeps every planning figure inside its published range and names a source', () => {
    for (const method of FEEDING_METHODS) {
      const a = WASTE_ALLOWANCES[method];
      expect(a.wasteFraction).toBeGreaterThanOrEqual(a.range.min);
      expect(a.wasteFraction).toBeLessThanOrEqual(a.range.max);
      expect(a.source).toMatch(/UMN/);
    }
    expect(WASTE_ALLOWANCES['round-bale-feeder'].range).toEqual({ min: 0.05, max: 0.33 });
  });

  it('rejects an unknown method with the list of valid ones', () => {
    const result = FeedingMethodSchema.safeParse('pitchfork');
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.message).toMatch(/^feedingMethod must be one of: small-square-feeder/);
  });
});
