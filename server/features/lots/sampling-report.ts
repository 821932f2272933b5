import { baleShapeOf } from '@shared/contracts/lots';
import { evaluateSampling, type SamplingEvaluation, type SamplingRecord } from '@shared/forage';
import type { lots, samplingRecords } from '../../db/schema';
import { balesToTons } from '@shared/units';

type LotFacts = Pick<typeof lots.$inferSelect, 'baleType' | 'harvestStartedOn' | 'harvestEndedOn' | 'baleCount' | 'avgBaleWeightLb'>;
type SamplingFacts = Pick<
  typeof samplingRecords.$inferSelect,
  'sampledOn' | 'coresTaken' | 'balesSampled' | 'probeDiameterIn' | 'probeLengthIn' | 'corePosition' | 'sampledBy'
>;

/** The grower's sampling facts alone (a stored row carries more columns than pages should see). */
export function samplingFactsOf(s: SamplingFacts): SamplingFacts {
  return {
    sampledOn: s.sampledOn,
    coresTaken: s.coresTaken,
    balesSampled: s.balesSampled,
    probeDiameterIn: s.probeDiameterIn,
    probeLengthIn: s.probeLengthIn,
    corePosition: s.corePosition,
    sampledBy: s.sampledBy,
  };
}

/** The engine's sampling record for a lot: the grower's sampling facts plus the lot's shape, harvest and size. */
export function samplingRecordOf(lot: LotFacts, s: SamplingFacts): SamplingRecord {
  return {
    ...samplingFactsOf(s),
    baleShape: baleShapeOf(lot.baleType),
    harvestStartedOn: lot.harvestStartedOn,
    harvestEndedOn: lot.harvestEndedOn,
    lotTons: balesToTons(lot.baleCount, lot.avgBaleWeightLb),
  };
}

/** The sampling record checked against the protocol as of `listedOn` (the sample-age check needs a date). */
export function samplingReportOf(lot: LotFacts, s: SamplingFacts, listedOn: Date): SamplingEvaluation {
  return evaluateSampling(samplingRecordOf(lot, s), { listedOn: listedOn.toISOString() });
}
