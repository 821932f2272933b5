/** Catalogue filters that live in the URL (their meaning is in shared/contracts/lots.ts). */
export const FILTER_KEYS = [
  'q',
  'rfvMin',
  'rfvMax',
  'rfqMin',
  'cpMin',
  'cpMax',
  'adfMax',
  'ndfMax',
  'nscMax',
  'forageType',
  'baleType',
  'cutting',
  'harvestYear',
  'priceMax',
  'tonsMin',
  'zip',
  'radiusMi',
  'compliantOnly',
  'verifiedOnly',
  'nitrateTestedOnly',
] as const;

/** Short names of the filters, for the empty state's "remove this filter" buttons. */
export const FILTER_LABELS: Record<(typeof FILTER_KEYS)[number], string> = {
  q: 'Search words',
  rfvMin: 'RFV from',
  rfvMax: 'RFV to',
  rfqMin: 'Min RFQ',
  cpMin: 'CP from',
  cpMax: 'CP to',
  adfMax: 'Max ADF',
  ndfMax: 'Max NDF',
  nscMax: 'Max NSC',
  forageType: 'Forage',
  baleType: 'Bale type',
  cutting: 'Cutting',
  harvestYear: 'Harvest year',
  priceMax: 'Max $/ton',
  tonsMin: 'Min tons',
  zip: 'ZIP and distance',
  radiusMi: 'Within miles',
  compliantOnly: 'Sampled to protocol only',
  verifiedOnly: 'Certified lab only',
  nitrateTestedOnly: 'Nitrate tested only',
};

export const SORT_OPTIONS = [
  { value: 'newest', label: 'Newest' },
  { value: 'price', label: 'Price per ton' },
  { value: 'price_dm', label: 'Price per ton of dry matter' },
  { value: 'rfv', label: 'Highest RFV' },
  { value: 'protein', label: 'Highest protein' },
  { value: 'distance', label: 'Nearest (needs ZIP)' },
];

/** URL query from the form: empty fields and unticked boxes are left out so links stay short. */
export function queryFromForm(values: Record<string, string | boolean>): Record<string, string | undefined> {
  const out: Record<string, string | undefined> = {};
  for (const key of FILTER_KEYS) {
    const v = values[key];
    if (typeof v === 'boolean') out[key] = v ? 'true' : undefined;
    else out[key] = v === undefined || String(v).trim() === '' ? undefined : String(v).trim();
  }
  return out;
}
