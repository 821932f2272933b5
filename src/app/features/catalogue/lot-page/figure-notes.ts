import type { ForageEvaluation } from '@shared/forage';

/** Plain-language names of the engine's method ids, so every figure says how it was computed. */
export const TDN_METHOD_LABELS: Record<ForageEvaluation['tdnMethod'], string> = {
  'adf-western': 'from ADF (western equation, as in USDA market reports)',
  'summative-nrc2001-legume': 'summative NRC (2001), legume form',
  'summative-nrc2001-grass': 'summative NRC (2001), grass form',
};

export const DE_METHOD_LABELS: Record<ForageEvaluation['horseDe']['method'], string> = {
  'nrc-2007-pagan': 'NRC (2007) horse equation from the full analysis',
  'tdn-approximation': 'approximated from TDN (less exact, flatters mature grass)',
};

export const NSC_METHOD_LABELS: Record<NonNullable<ForageEvaluation['nscMethod']>, string> = {
  'wsc-plus-starch': 'WSC + starch',
  'esc-plus-starch': 'ESC + starch',
};

export const NSC_FLAG_TEXT: Record<NonNullable<ForageEvaluation['nscFlag']>, string> = {
  'within-advised-limit': 'Below the 10% of dry matter commonly advised for horses with insulin dysregulation or laminitis risk.',
  'above-strict-limit': 'Between 10 and 12% of dry matter: above the strict limit commonly advised for metabolic horses.',
  'above-upper-limit': 'At or above 12% of dry matter: above the usual limit for metabolic horses.',
};

/** One line on what each index means. */
export const FIGURE_MEANINGS = {
  rfv: 'Relative feed value: digestible dry matter × intake potential, scaled so full-bloom alfalfa scores 100. Built for legumes; it under-ranks grasses.',
  rfq: 'Relative forage quality: like RFV but from fibre digestibility (NDFD) and TDN, so it ranks grasses more fairly.',
  rfqMissing: 'Not computed: the report has no 48-hour NDF digestibility.',
  tdn: 'Total digestible nutrients: the share of the dry matter an animal can digest.',
  de: 'Digestible energy for horses: what the hay supplies toward a horse’s daily energy need.',
  nsc: 'Non-structural carbohydrate: sugars, fructans and starch, judged on dry matter.',
  dmi: 'Intake potential used by RFV: how much of this hay an animal is expected to eat, % of body weight.',
} as const;
