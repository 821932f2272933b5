import { eq } from 'drizzle-orm';
import { photos } from '../../db/schema';
import { startTestApi, type TestApi } from '../../../tests/support/test-api';
import { LOT_STEP, makeJpeg, signedInGrower } from '../../../tests/support/grower-lot';
import { PHOTOS_PER_LOT, PHOTOS_PER_REQUEST } from './upload-limits';

// Real concurrency against PostgreSQL: requests that each fit under the limit on their own must not
// together pass it, and the ones that fit must go through. Before the count was taken under a lock on the
// lot, each request counted the photos before the others' were in: one got 201 and the other three a 409
// from a clash on photo positions (earlier, without that index, a lot ended with 42 photos).
describe('the per-lot photo limit under parallel uploads', () => {
  let t: TestApi;
  beforeAll(async () => {
    t = await startTestApi();
  });
  afterAll(() => t.close());

  it(`holds at ${PHOTOS_PER_LOT} when four uploads of ${PHOTOS_PER_REQUEST} arrive at once, and every photo stored is one a 201 reported`, async () => {
    const grower = await signedInGrower(t);
    const lotId = (await grower.agent.post('/selling/lots', LOT_STEP)).body.id as number;
    const token = await grower.agent.token();
    const jpeg = await makeJpeg(400, 300);
    const batch = () => {
      let req = grower.agent.raw.post(`/uploads/lots/${lotId}/photos`).set('X-XSRF-TOKEN', token);
      for (let i = 0; i < PHOTOS_PER_REQUEST; i++) req = req.attach('photos', jpeg, `bales-${i}.jpg`);
      return req.then((res) => res);
    };
    const answers = await Promise.all([batch(), batch(), batch(), batch()]);

    const stored = await t.deps.db.select({ position: photos.position, isCover: photos.isCover }).from(photos).where(eq(photos.lotId, lotId));
    const accepted = answers.filter((r) => r.status === 201);
    expect(answers.map((r) => r.status).sort()).toEqual([201, 201, 400, 400]);
    expect(answers.filter((r) => r.status === 400).every((r) => r.body.error.code === 'too_many_photos')).toBe(true);
    expect(stored.length).toBe(accepted.reduce((n, r) => n + r.body.photos.length, 0));
    expect(stored.length).toBeLessThanOrEqual(PHOTOS_PER_LOT);
    // One cover, and positions 0..n-1 with no two photos in one place.
    expect(stored.filter((p) => p.isCover)).toHaveLength(1);
    expect(stored.map((p) => p.position).sort((a, b) => a - b)).toEqual([...Array(stored.length).keys()]);
  }, 120_000);
});
