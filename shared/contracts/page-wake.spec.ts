import { pageWaitsForUse } from './page-wake';

describe('pageWaitsForUse', () => {
  it('is the catalogue, with or without a trailing slash', () => {
    expect(pageWaitsForUse('/hay')).toBe(true);
    expect(pageWaitsForUse('/hay/')).toBe(true);
  });

  it('is no other page: a lot, the comparison, forms, the home page', () => {
    for (const path of ['/hay/12', '/hay/compare', '/sign-in', '/planner', '/', '/hayloft']) expect(pageWaitsForUse(path)).toBe(false);
  });
});
