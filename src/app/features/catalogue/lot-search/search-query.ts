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

/** The filters that are a tick (in the URL as `true`, or absent). */
const TICK_FILTERS: ReadonlySet<string> = new Set<(typeof FILTER_KEYS)[number]>(['compliantOnly', 'verifiedOnly', 'nitrateTestedOnly']);

/** Whether a filter is a tick rather than a value. */
export function isTickFilter(key: string): boolean {
  return TICK_FILTERS.has(key);
}

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
export function queryFromForm(values: Record<string, string | number | boolean | null | undefined>): Record<string, string | undefined> {
  const out: Record<string, string | undefined> = {};
  for (const key of FILTER_KEYS) {
    const v = values[key];
    if (typeof v === 'boolean') out[key] = v ? 'true' : undefined;
    // An emptied number field reads as null: it means "no filter", never the text 'null'.
    else out[key] = v === undefined || v === null || String(v).trim() === '' ? undefined : String(v).trim();
  }
  return out;
}

/**
 * The URL's query without empty entries. The filters' form sent by the browser itself (before the page's
 * scripts run, or without them) names every field, the empty ones too; an empty field is no filter.
 */
export function filledParams(params: Record<string, string | undefined>): Record<string, string> {
  return Object.fromEntries(Object.entries(params).filter(([, v]) => v !== undefined && v !== '')) as Record<string, string>;
}

/** Whether the query holds any filter (a sort or a page alone does not narrow the search). */
export function hasAnyFilter(query: Record<string, string | undefined>): boolean {
  return FILTER_KEYS.some((k) => query[k] !== undefined && query[k] !== '');
}

/**
 * The query to send to the API. "Nearest" needs a ZIP; without one (a cleared form, an old link) the lots
 * come back newest first and `notice` says why, instead of the API's validation error.
 */
export function apiQueryFor(params: Record<string, string | undefined>): { query: Record<string, string>; notice: string | null } {
  const query = filledParams(params);
  if (query['sort'] === 'distance' && !query['zip']) {
    delete query['sort'];
    return { query, notice: 'Give your ZIP code to sort by distance; until then the newest lots come first.' };
  }
  if (query['radiusMi'] && !query['zip']) {
    delete query['radiusMi'];
    return { query, notice: 'Give your ZIP code to limit the distance.' };
  }
  return { query, notice: null };
}

const UNITS: Partial<Record<(typeof FILTER_KEYS)[number], string>> = {
  cpMin: '%', cpMax: '%', adfMax: '%', ndfMax: '%', nscMax: '%',
};

/**
 * A saved search in words, e.g. "RFV from 150 · Forage: Alfalfa · within 50 mi of 66502 · sorted by price per ton".
 * `names` turns coded values (forage, bale type) into their labels.
 */
export function describeQuery(query: Record<string, string>, names: Record<string, string> = {}): string {
  const parts: string[] = [];
  for (const key of FILTER_KEYS) {
    const v = query[key];
    if (v === undefined || v === '' || key === 'radiusMi') continue;
    if (key === 'zip') parts.push(query['radiusMi'] ? `within ${query['radiusMi']} mi of ${v}` : `near ${v}`);
    else if (isTickFilter(key)) parts.push(FILTER_LABELS[key].toLowerCase());
    else if (key === 'q') parts.push(`“${v}”`);
    else if (key === 'forageType' || key === 'baleType') parts.push(`${FILTER_LABELS[key]}: ${names[v] ?? v}`);
    else parts.push(`${FILTER_LABELS[key]} ${v}${UNITS[key] ?? ''}`);
  }
  const sort = SORT_OPTIONS.find((s) => s.value === query['sort'] && s.value !== 'newest');
  if (sort) parts.push(`sorted by ${sort.label.replace(' (needs ZIP)', '').toLowerCase()}`);
  return parts.length > 0 ? parts.join(' · ') : 'every lot';
}
