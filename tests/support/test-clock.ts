import { fixedClock } from '../../server/clock';

/**
 * The date every server test runs on. Fixture dates (harvest, sampling, lab report) sit a few weeks
 * before it, so the sample-age check gives the same answer in any year the suite is run.
 */
export const TEST_NOW = '2026-09-15T12:00:00.000Z';

export const testClock = () => fixedClock(TEST_NOW);
