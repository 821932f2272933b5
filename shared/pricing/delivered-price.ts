import { type Cents, roundCents } from '../units/money';
import { DEFAULT_TONS_PER_LOAD, freightPerLoadCents, loadsForTons } from './freight';

export interface DeliveredPriceInput {
  /** Hay price at the farm, cents per short ton as-fed. */
  readonly pricePerTonCents: Cents;
  /** Short tons bought, as-fed. */
  readonly tons: number;
  /** Trucking rate, cents per loaded mile. */
  readonly freightCentsPerLoadedMile: number;
  /** Loaded (one-way) miles from the farm to the buyer. */
  readonly distanceMi: number;
  /** Short tons per truck load (default 24, practice). */
  readonly tonsPerLoad?: number;
}

export interface DeliveredPrice {
  /** Hay cost before freight, whole cents. */
  readonly hayCents: Cents;
  /** Truck loads needed (whole loads). */
  readonly loads: number;
  /** Freight for all loads, whole cents. */
  readonly freightCents: Cents;
  /** Hay plus freight, whole cents. */
  readonly totalCents: Cents;
  /** Freight spread over the tons bought, cents per ton (fractional; 0 when no tons). */
  readonly freightPerTonCents: number;
  /** Total spread over the tons bought, cents per ton as-fed (fractional; 0 when no tons). */
  readonly deliveredPerTonCents: number;
}

/**
 * Delivered cost of a hay purchase: hay + freight, where freight = rate × miles × loads and
 * loads = ceil(tons / tons per load). 24 t at $180/t hauled 300 mi at $3.50/mi costs
 * $4,320 + $1,050 = $5,370, i.e. $223.75/t delivered ($43.75/t freight, domain brief §11).
 */
export function deliveredPrice(input: DeliveredPriceInput): DeliveredPrice {
  const tonsPerLoad = input.tonsPerLoad ?? DEFAULT_TONS_PER_LOAD;
  const loads = loadsForTons(input.tons, tonsPerLoad);
  if (!(input.pricePerTonCents >= 0)) throw new RangeError(`pricePerTonCents must be non-negative; got ${input.pricePerTonCents}`);
  const hayCents = roundCents(input.pricePerTonCents * input.tons);
  const freightCents = freightPerLoadCents(input.freightCentsPerLoadedMile, input.distanceMi) * loads;
  const totalCents = hayCents + freightCents;
  return {
    hayCents,
    loads,
    freightCents,
    totalCents,
    freightPerTonCents: input.tons > 0 ? freightCents / input.tons : 0,
    deliveredPerTonCents: input.tons > 0 ? totalCents / input.tons : 0,
  };
}
