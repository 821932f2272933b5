import { calendarDaysBetween, hoursBetween, instantSpan } from '../time/days';
import type { BaleShape, CorePosition, Finding, SamplingEvaluation, SamplingRecord } from './forage-contract';

/*
 * Checks a sampling record against published hay-sampling protocol:
 * - lot: one field, one cutting, generally < 200 t (Putnam & Orloff, NFTA sampling principles);
 *   ≤ 200 t (Teutsch, Univ. Kentucky 2020); harvested within 48 h (NDSU / forage sampling fact sheet);
 * - at least 20 cores from 20 bales, one core per bale (Teutsch 2020);
 * - probe internal diameter ≥ 3/8 in; length ideally ≥ 14 in (Teutsch 2020) and able to reach
 *   12–18 in deep (NFTA; NDSU); 3/8–3/4 in diameter range from memory (NFTA);
 * - small rectangular bales: centre of the butt (small) end; round bales: the curved side,
 *   never the flat ends; never grab samples (NFTA; NDSU);
 * - sample close to sale; one guide waits 3–4 weeks after baling for the hay to finish
 *   "sweating" (Teutsch 2020).
 * Compliant = no error. Dates without a time are whole UTC days.
 */

/** Fewest cores (one per bale) for a representative composite sample. */
export const MIN_CORES = 20;
/** Largest lot one sample may describe, short tons as fed (≤ 200 t; S21 states it on DM, so as-fed is the stricter reading). */
export const MAX_LOT_TONS = 200;
/** Longest harvest window for one lot, hours. */
export const MAX_HARVEST_WINDOW_HOURS = 48;
/** Smallest probe internal diameter, inches. */
export const MIN_PROBE_DIAMETER_IN = 3 / 8;
/** Upper end of the usual probe diameter range, inches (from memory, NFTA). */
export const USUAL_MAX_PROBE_DIAMETER_IN = 3 / 4;
/** Shortest probe that can core 12 in deep, inches. */
export const MIN_PROBE_LENGTH_IN = 12;
/** Recommended minimum probe length, inches. */
export const IDEAL_PROBE_LENGTH_IN = 14;
/** Default oldest acceptable sample at listing, days (Baleproof policy). */
export const DEFAULT_MAX_SAMPLE_AGE_DAYS = 180;
/** Days after baling before DM settles (Teutsch 2020: 3–4 weeks). */
export const SWEAT_PERIOD_DAYS = 21;

/** Listing context for the sample-age check. */
export interface SamplingOptions {
  /** Date the lot is listed (ISO date or date-time). */
  listedOn: string;
  /** Oldest acceptable sample at listing, days; default 180. */
  maxSampleAgeDays?: number;
}

function corePositionFindings(shape: BaleShape, position: CorePosition): Finding[] {
  if (position === 'grab') {
    return [
      {
        severity: 'warning',
        code: 'grab-sample',
        message: 'A grab sample is not representative: take cores with a bale probe instead.',
      },
    ];
  }
  const square = shape === 'small-square' || shape === 'large-square';
  if (square && position === 'butt-end-centre') return [];
  if (!square && position === 'round-side') return [];
  if (square && position === 'bale-side') {
    return [
      {
        severity: 'warning',
        code: 'core-position-square-side',
        message: 'Square bales should be cored in the centre of the butt (small) end, between the strings, not from the side.',
      },
    ];
  }
  if (!square && position === 'round-flat-end') {
    return [
      {
        severity: 'warning',
        code: 'core-position-round-flat-end',
        message: 'Round bales should be cored from the curved side toward the centre, never from the flat ends.',
      },
    ];
  }
  return [
    {
      severity: 'warning',
      code: 'core-position-mismatch',
      message: square
        ? 'The core position recorded is for round bales; square bales are cored in the centre of the butt end.'
        : 'The core position recorded is for square bales; round bales are cored from the curved side.',
    },
  ];
}

function probeFindings(record: SamplingRecord): Finding[] {
  if (record.corePosition === 'grab') return [];
  const findings: Finding[] = [];
  const { probeDiameterIn: diameter, probeLengthIn: length } = record;
  if (diameter === undefined || length === undefined) {
    findings.push({
      severity: 'warning',
      code: 'probe-not-recorded',
      message: 'Record the probe’s internal diameter and length so the sampling can be checked.',
    });
  }
  if (diameter !== undefined && diameter < MIN_PROBE_DIAMETER_IN) {
    findings.push({
      severity: 'error',
      code: 'probe-diameter-too-small',
      message: `The probe’s internal diameter (${diameter} in) is below the 3/8 in minimum.`,
    });
  } else if (diameter !== undefined && diameter > USUAL_MAX_PROBE_DIAMETER_IN) {
    findings.push({
      severity: 'info',
      code: 'probe-diameter-above-usual',
      message: `The probe’s internal diameter (${diameter} in) is wider than the usual 3/8–3/4 in.`,
    });
  }
  if (length !== undefined && length < MIN_PROBE_LENGTH_IN) {
    findings.push({
      severity: 'error',
      code: 'probe-too-short',
      message: `A ${length} in probe cannot core the 12–18 in deep the protocol requires.`,
    });
  } else if (length !== undefined && length < IDEAL_PROBE_LENGTH_IN) {
    findings.push({
      severity: 'warning',
      code: 'probe-shorter-than-ideal',
      message: `A ${length} in probe is shorter than the recommended 14 in or more (ideally 15–18 in).`,
    });
  }
  return findings;
}

function lotFindings(record: SamplingRecord): Finding[] {
  const findings: Finding[] = [];
  if (record.coresTaken < MIN_CORES) {
    findings.push({
      severity: 'error',
      code: 'too-few-cores',
      message: `Only ${record.coresTaken} cores were taken; a lot needs at least ${MIN_CORES}, one from each of ${MIN_CORES} bales chosen at random.`,
    });
  }
  if (record.balesSampled < record.coresTaken) {
    findings.push({
      severity: 'error',
      code: 'multiple-cores-per-bale',
      message: `${record.coresTaken} cores came from ${record.balesSampled} bales; take one core per bale from separate bales.`,
    });
  } else if (record.balesSampled > record.coresTaken) {
    findings.push({
      severity: 'warning',
      code: 'bales-exceed-cores',
      message: `${record.balesSampled} bales are recorded as sampled but only ${record.coresTaken} cores; with one core per bale the two should match.`,
    });
  }
  if (record.lotTons > MAX_LOT_TONS) {
    findings.push({
      severity: 'error',
      code: 'lot-too-large',
      message: `A ${record.lotTons} t lot is over the ${MAX_LOT_TONS} t limit for one sample; split it into smaller lots and sample each.`,
    });
  }
  return findings;
}

function dateFindings(record: SamplingRecord, options: SamplingOptions): Finding[] {
  const findings: Finding[] = [];
  const harvestStart = instantSpan(record.harvestStartedOn).start;
  const harvestEnd = instantSpan(record.harvestEndedOn).end;
  if (harvestEnd.getTime() <= harvestStart.getTime()) {
    findings.push({
      severity: 'error',
      code: 'harvest-dates-reversed',
      message: 'The harvest end is not after the harvest start; check the dates.',
    });
  } else if (hoursBetween(harvestStart, harvestEnd) > MAX_HARVEST_WINDOW_HOURS) {
    findings.push({
      severity: 'warning',
      code: 'harvest-window-over-48h',
      message: `The lot was harvested over more than ${MAX_HARVEST_WINDOW_HOURS} hours; hay baled further apart may differ in maturity and weather, so it is better sampled as separate lots.`,
    });
  }

  const daysAfterHarvest = calendarDaysBetween(record.harvestEndedOn, record.sampledOn);
  if (daysAfterHarvest < 0) {
    findings.push({
      severity: 'error',
      code: 'sampled-before-harvest-ended',
      message: 'The sample is dated before the harvest ended, so it cannot represent the whole lot.',
    });
  } else if (daysAfterHarvest < SWEAT_PERIOD_DAYS) {
    findings.push({
      severity: 'info',
      code: 'sampled-during-sweat',
      message: 'The sample was taken within 3 weeks of baling, while hay is still “sweating”; dry matter may shift before sale.',
    });
  }

  const maxAge = options.maxSampleAgeDays ?? DEFAULT_MAX_SAMPLE_AGE_DAYS;
  const ageDays = calendarDaysBetween(record.sampledOn, options.listedOn);
  if (ageDays < 0) {
    findings.push({
      severity: 'error',
      code: 'sampled-after-listing',
      message: 'The sample is dated after the listing date; check the dates.',
    });
  } else if (ageDays > maxAge) {
    findings.push({
      severity: 'error',
      code: 'sample-too-old',
      message: `The sample is ${ageDays} days old at listing; samples older than ${maxAge} days no longer describe the hay, so resample the lot.`,
    });
  }
  return findings;
}

/**
 * Checks how a lot was sampled. `record` should already be parsed by `SamplingRecordSchema`.
 * Compliant when no finding is an error. Throws RangeError for an unparseable `listedOn`
 * (a programming error: it comes from the server, not the user).
 */
export function evaluateSampling(record: SamplingRecord, options: SamplingOptions): SamplingEvaluation {
  if (Number.isNaN(instantSpan(options.listedOn).start.getTime())) {
    throw new RangeError(`listedOn must be an ISO date or date-time, got "${options.listedOn}"`);
  }
  const findings = [
    ...lotFindings(record),
    ...corePositionFindings(record.baleShape, record.corePosition),
    ...probeFindings(record),
    ...dateFindings(record, options),
  ];
  return { compliant: findings.every((f) => f.severity !== 'error'), findings };
}
