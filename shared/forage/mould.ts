import type { Finding } from './forage-contract';
import type { VisualMouldScore } from './mould-scores';

/*
 * Mould and mycotoxins in hay. Labs report a mould count in colony-forming units per gram (CFU/g) and mycotoxins in
 * ppb (aflatoxin) or ppm (DON, fumonisin); growers can also say what they saw when bales were opened.
 *
 * Mould count bands (CFU/g): AgSource Laboratories, "Mold/Yeast/Mycotoxin Testing": 10–10,000 relatively safe,
 * 10,000–100,000 transition zone, 100,000–10,000,000 caution advised, over 10,000,000 feeding may not be recommended.
 * For horses, which are more sensitive to mould than cattle, Dr. Robert Wright (OMAFRA) considers good horse hay to
 * hold no more than 25,000 CFU/g (EquiSearch, "Hays and Molds").
 *
 * Mycotoxin guidance (FDA), for horses:
 *   aflatoxin 20 ppb in feeds for all animals (FDA CPG Sec. 683.100, as tabled by the Office of Indiana State Chemist);
 *   DON (vomitoxin) 5 ppm in grain for "all other animals" at no more than 40 % of the ration, i.e. 2 ppm in the whole
 *   ration (FDA advisory levels, 2010, as read by OMAFRA "Mycotoxin levels and interpretation");
 *   fumonisin 5 ppm in corn for equids at no more than 20 % of the diet, i.e. 1 ppm in the whole diet (FDA guidance
 *   for industry, 2001). Hay is most of a horse's diet, so its result is read against the whole-ration figure.
 */


/** Levels the findings are read against; every source is named in the header above. */
export const MOULD_LEVELS = {
  goodHorseHayCfuPerG: 25_000,
  cautionCfuPerG: 100_000,
  notRecommendedCfuPerG: 10_000_000,
  aflatoxinPpb: 20,
  donWholeRationPpm: 2,
  fumonisinWholeDietPpm: 1,
} as const;

export interface MouldResults {
  /** Mould count from the lab, colony-forming units per gram. */
  mouldCfuPerG?: number | null | undefined;
  /** What the grower saw when bales were opened. */
  visualMouldScore?: VisualMouldScore | null | undefined;
  aflatoxinPpb?: number | null | undefined;
  donPpm?: number | null | undefined;
  fumonisinPpm?: number | null | undefined;
}

const VET = 'Ask your veterinarian before feeding it.';
const count = (n: number) => Math.round(n).toLocaleString('en-US');

/** Findings for mould counts, mycotoxins and a visual mould score; none when nothing was reported. */
export function mouldFindings(r: MouldResults): Finding[] {
  const out: Finding[] = [];
  const cfu = r.mouldCfuPerG ?? null;
  if (cfu !== null) {
    const reading = `Mould count ${count(cfu)} CFU/g`;
    if (cfu > MOULD_LEVELS.notRecommendedCfuPerG) {
      out.push({ severity: 'warning', code: 'mould-count-not-recommended', message: `${reading} is above 10,000,000 CFU/g, where labs advise that feeding may not be recommended. Do not feed it to horses without professional advice. ${VET}` });
    } else if (cfu > MOULD_LEVELS.cautionCfuPerG) {
      out.push({ severity: 'warning', code: 'mould-count-caution', message: `${reading} is in the 100,000–10,000,000 CFU/g range where labs advise caution; horses are more sensitive to mould than cattle, especially horses with heaves. ${VET}` });
    } else if (cfu > MOULD_LEVELS.goodHorseHayCfuPerG) {
      out.push({ severity: 'info', code: 'mould-count-above-horse-hay', message: `${reading} is above the 25,000 CFU/g an extension specialist gives for good horse hay, though below the level labs flag for caution. Horses with heaves or dust allergies may react to it; soak or steam it only on your veterinarian's advice.` });
    } else {
      out.push({ severity: 'info', code: 'mould-count-low', message: `${reading} is within the 25,000 CFU/g an extension specialist gives for good horse hay.` });
    }
  }
  const seen = r.visualMouldScore ?? null;
  if (seen === 'moderate' || seen === 'heavy') {
    out.push({ severity: 'warning', code: 'mould-seen', message: `The grower saw ${seen} mould when bales were opened. Mouldy hay can cause colic and breathing problems in horses and may carry mycotoxins: do not feed mouldy flakes. ${VET}` });
  } else if (seen === 'slight') {
    out.push({ severity: 'info', code: 'mould-seen-slight', message: 'The grower saw slight mould in some flakes. Open bales where the horses will not breathe the dust, and throw away any mouldy or musty flakes. Ask your veterinarian if in doubt.' });
  }
  const toxin = (value: number | null | undefined, limit: number, key: string, name: string, unit: string, basis: string) => {
    if (value === null || value === undefined) return;
    out.push(
      value > limit
        ? { severity: 'warning', code: `${key}-above-guidance`, message: `${name} ${value} ${unit} is above the ${limit} ${unit} ${basis}. Do not feed it to horses without professional advice. ${VET}` }
        : { severity: 'info', code: `${key}-within-guidance`, message: `${name} ${value} ${unit} is within the ${limit} ${unit} ${basis}.` },
    );
  };
  toxin(r.aflatoxinPpb, MOULD_LEVELS.aflatoxinPpb, 'aflatoxin', 'Aflatoxin', 'ppb', 'FDA action level for feed');
  toxin(r.donPpm, MOULD_LEVELS.donWholeRationPpm, 'don', 'DON (vomitoxin)', 'ppm', 'FDA advisory level for a whole ration for horses');
  toxin(r.fumonisinPpm, MOULD_LEVELS.fumonisinWholeDietPpm, 'fumonisin', 'Fumonisin', 'ppm', 'FDA guidance level for a whole horse diet (fumonisin can cause a fatal brain disease in horses)');
  return out;
}
