import type { CorePosition } from '../contracts/enums';
import { baleShapeOf, type BaleType } from '../contracts/lots';
import { balesToTons } from '../units/bales';
import type { SamplingEvaluation, SamplingRecord } from './forage-contract';
import { evaluateSampling } from './sampling-findings';

/** What the sampling check needs from the lot itself: bale shape, harvest window, size and listing date. */
export interface SamplingLotFacts {
  readonly baleType: BaleType;
  readonly harvestStartedOn: string;
  readonly harvestEndedOn: string;
  readonly baleCount: number;
  readonly avgBaleWeightLb: number;
  /** When the lot was first listed; null or absent while it never was. */
  readonly publishedAt?: Date | null;
}

/** The grower's own sampling facts, as the sampling step saves them. */
export interface SamplingFacts {
  readonly sampledOn: string;
  readonly coresTaken: number;
  readonly balesSampled: number;
  readonly probeDiameterIn?: number;
  readonly probeLengthIn?: number;
  readonly corePosition: CorePosition;
  readonly sampledBy: string;
}

/** The grower's sampling facts alone (a stored row carries more columns than pages should see). */
export function samplingFactsOf<T extends SamplingFacts>(s: T): Pick<T, keyof SamplingFacts> {
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

/**
 * The engine's sampling record for a lot: the grower's sampling facts plus the lot's bale shape, harvest
 * window and size. Built here only, for the lot form's live check in the browser and for the server.
 */
export function samplingRecordOf(lot: SamplingLotFacts, s: SamplingFacts): SamplingRecord {
  return {
    ...samplingFactsOf(s),
    baleShape: baleShapeOf(lot.baleType),
    harvestStartedOn: lot.harvestStartedOn,
    harvestEndedOn: lot.harvestEndedOn,
    lotTons: balesToTons(lot.baleCount, lot.avgBaleWeightLb),
  };
}

/**
 * The sampling verdict, the one rule for it: the record checked against the protocol as of the day the
 * lot was first listed, or `now` while it never was (the sample-age check needs a date). The server
 * stores it with the sampling record whenever one of its inputs changes and refreshes every stored one
 * on start and daily (so rows saved under earlier rules catch up); every reader (catalogue filter, lot
 * page, lot form, review desk) reads that stored verdict, so they cannot disagree.
 */
export function samplingVerdictOf(lot: SamplingLotFacts, s: SamplingFacts, now: Date): SamplingEvaluation {
  return evaluateSampling(samplingRecordOf(lot, s), { listedOn: (lot.publishedAt ?? now).toISOString() });
}
