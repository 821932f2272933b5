import type { BaleType, ForageType } from '@shared/contracts/lots';
import type { ForageClass } from '@shared/contracts/enums';

/*
 * The demo scenario. Everything here is invented for demonstration: the "Cottonwood Basin" region,
 * its growers, farms, labs and every figure. Farm locations use ZIP codes only so distance search works.
 */

export const DEMO_DOMAIN = 'demo.baleproof.example';

export const DEMO_PASSWORDS = { grower: 'demo-grower-pass', buyer: 'demo-buyer-pass' } as const;

export interface DemoFarm {
  key: string;
  ownerName: string;
  ownerEmail: string;
  name: string;
  addressLine: string;
  zip: string;
  deliveryRadiusMi: number;
  loadingFacilities: string;
  pickupHours: string;
  description: string;
}

export const DEMO_FARMS: DemoFarm[] = [
  {
    key: 'larkspur',
    ownerName: 'Ada Fenwick',
    ownerEmail: `grower@${DEMO_DOMAIN}`,
    name: 'Larkspur Bend Farm',
    addressLine: '1400 Gravel Spur Rd',
    zip: '66502',
    deliveryRadiusMi: 150,
    loadingFacilities: 'Telehandler and squeeze for large bales; loading dock for small squares.',
    pickupHours: 'Mon–Sat 7am–5pm',
    description: 'Irrigated alfalfa and orchardgrass on river-bottom ground, stored in a pole barn.',
  },
  {
    key: 'ninebark',
    ownerName: 'Tomas Lindqvist-Reyes',
    ownerEmail: `ninebark@${DEMO_DOMAIN}`,
    name: 'Ninebark Hollow Hay',
    addressLine: '88 County Line 12',
    zip: '67401',
    deliveryRadiusMi: 250,
    loadingFacilities: 'Flatbed loading by forklift.',
    pickupHours: 'By appointment',
    description: 'Dryland grass hay: timothy, teff and bromegrass, cut early for horse owners.',
  },
  {
    key: 'whistling-teal',
    ownerName: 'June Okoro',
    ownerEmail: `tealranch@${DEMO_DOMAIN}`,
    name: 'Whistling Teal Ranch',
    addressLine: '5 Windbreak Lane',
    zip: '68901',
    deliveryRadiusMi: 300,
    loadingFacilities: 'Two tractors with spears; room for semi turnaround.',
    pickupHours: 'Daily 6am–8pm',
    description: 'Large rounds and large squares of alfalfa and alfalfa–grass mixes.',
  },
  {
    key: 'copperleaf',
    ownerName: 'Hal Brightmoor',
    ownerEmail: `copperleaf@${DEMO_DOMAIN}`,
    name: 'Copperleaf Flats',
    addressLine: '212 Old Mill Rd',
    zip: '67501',
    deliveryRadiusMi: 120,
    loadingFacilities: 'Hand loading help for small squares.',
    pickupHours: 'Sat 8am–noon',
    description: 'Bermudagrass and grass mixes in small squares for backyard barns.',
  },
  {
    key: 'oxbow',
    ownerName: 'Rosa Delacroix-Haines',
    ownerEmail: `oxbow@${DEMO_DOMAIN}`,
    name: 'Oxbow Pennant Farm',
    addressLine: '9 Prairie Rose Ct',
    zip: '66801',
    deliveryRadiusMi: 200,
    loadingFacilities: 'Bale elevator and dock.',
    pickupHours: 'Weekdays after 4pm',
    description: 'Tested low-sugar grass hay, sampled every cutting.',
  },
];

export const DEMO_BUYERS = [
  { name: 'Maren Halvorsen', email: `buyer@${DEMO_DOMAIN}`, zip: '66044' },
  { name: 'Felix Amadi', email: `felix@${DEMO_DOMAIN}`, zip: '68502' },
  { name: 'Priya Castellanos', email: `priya@${DEMO_DOMAIN}`, zip: '67202' },
];

export const DEMO_LABS = ['Sandhill Forage Analytics (demo)', 'Riverbend Feed Lab (demo)', 'Tallgrass Agronomy Lab (demo)'];

/** Plausible DM-basis ranges per forage for the invented analyses (common practice, rounded). */
export interface ForageProfile {
  forageType: ForageType;
  forageClass: ForageClass;
  cp: [number, number];
  adf: [number, number];
  ndf: [number, number];
  wsc: [number, number];
  tint: 'green' | 'gold' | 'olive';
}

export const FORAGE_PROFILES: Record<string, ForageProfile> = {
  alfalfa: { forageType: 'alfalfa', forageClass: 'legume', cp: [17, 24], adf: [25, 36], ndf: [32, 46], wsc: [7, 12], tint: 'green' },
  timothy: { forageType: 'timothy', forageClass: 'grass', cp: [7, 12], adf: [32, 40], ndf: [56, 66], wsc: [8, 14], tint: 'gold' },
  orchardgrass: { forageType: 'orchardgrass', forageClass: 'grass', cp: [9, 14], adf: [30, 38], ndf: [52, 62], wsc: [7, 13], tint: 'olive' },
  bermudagrass: { forageType: 'bermudagrass', forageClass: 'grass', cp: [9, 14], adf: [30, 38], ndf: [63, 72], wsc: [6, 11], tint: 'olive' },
  teff: { forageType: 'teff', forageClass: 'grass', cp: [9, 15], adf: [32, 40], ndf: [55, 65], wsc: [5, 9], tint: 'gold' },
  bromegrass: { forageType: 'bromegrass', forageClass: 'grass', cp: [8, 13], adf: [33, 40], ndf: [56, 65], wsc: [8, 13], tint: 'gold' },
  mix: { forageType: 'alfalfa_grass_mix', forageClass: 'mixed', cp: [14, 18], adf: [30, 36], ndf: [45, 55], wsc: [7, 12], tint: 'green' },
  grassMix: { forageType: 'grass_mix', forageClass: 'grass', cp: [8, 12], adf: [32, 39], ndf: [55, 64], wsc: [6, 10], tint: 'gold' },
};

export interface DemoLotPlan {
  farm: string;
  profile: keyof typeof FORAGE_PROFILES;
  field: string;
  cutting: number;
  baleType: BaleType;
  baleWeightLb: number;
  bales: number;
  priceDollarsPerTon: number;
  status: 'listed' | 'in_review' | 'draft';
}

const SMALL2: BaleType = 'small_square_2_string';
const SMALL3: BaleType = 'small_square_3_string';

export const DEMO_LOTS: DemoLotPlan[] = [
  { farm: 'larkspur', profile: 'alfalfa', field: 'North Pivot', cutting: 1, baleType: SMALL3, baleWeightLb: 105, bales: 900, priceDollarsPerTon: 310, status: 'listed' },
  { farm: 'larkspur', profile: 'alfalfa', field: 'North Pivot', cutting: 2, baleType: SMALL3, baleWeightLb: 110, bales: 850, priceDollarsPerTon: 335, status: 'listed' },
  { farm: 'larkspur', profile: 'alfalfa', field: 'River Forty', cutting: 3, baleType: 'large_square_3x4x8', baleWeightLb: 1150, bales: 120, priceDollarsPerTon: 285, status: 'listed' },
  { farm: 'larkspur', profile: 'orchardgrass', field: 'Creek Bottom', cutting: 1, baleType: SMALL2, baleWeightLb: 58, bales: 1400, priceDollarsPerTon: 290, status: 'listed' },
  { farm: 'larkspur', profile: 'orchardgrass', field: 'Creek Bottom', cutting: 2, baleType: SMALL2, baleWeightLb: 55, bales: 1100, priceDollarsPerTon: 305, status: 'listed' },
  { farm: 'larkspur', profile: 'mix', field: 'Hilltop', cutting: 2, baleType: 'round_4x5', baleWeightLb: 950, bales: 140, priceDollarsPerTon: 190, status: 'in_review' },
  { farm: 'ninebark', profile: 'timothy', field: 'East Quarter', cutting: 1, baleType: SMALL2, baleWeightLb: 62, bales: 1600, priceDollarsPerTon: 330, status: 'listed' },
  { farm: 'ninebark', profile: 'timothy', field: 'East Quarter', cutting: 2, baleType: SMALL2, baleWeightLb: 60, bales: 900, priceDollarsPerTon: 315, status: 'listed' },
  { farm: 'ninebark', profile: 'teff', field: 'Sand Draw', cutting: 1, baleType: SMALL2, baleWeightLb: 55, bales: 1200, priceDollarsPerTon: 275, status: 'listed' },
  { farm: 'ninebark', profile: 'teff', field: 'Sand Draw', cutting: 2, baleType: 'large_square_3x3x8', baleWeightLb: 800, bales: 90, priceDollarsPerTon: 240, status: 'listed' },
  { farm: 'ninebark', profile: 'bromegrass', field: 'Schoolhouse', cutting: 1, baleType: 'round_5x5', baleWeightLb: 1250, bales: 110, priceDollarsPerTon: 150, status: 'listed' },
  { farm: 'ninebark', profile: 'timothy', field: 'West Quarter', cutting: 1, baleType: SMALL3, baleWeightLb: 100, bales: 500, priceDollarsPerTon: 345, status: 'draft' },
  { farm: 'whistling-teal', profile: 'alfalfa', field: 'Pivot 3', cutting: 1, baleType: 'large_square_4x4x8', baleWeightLb: 1750, bales: 160, priceDollarsPerTon: 240, status: 'listed' },
  { farm: 'whistling-teal', profile: 'alfalfa', field: 'Pivot 3', cutting: 2, baleType: 'large_square_4x4x8', baleWeightLb: 1800, bales: 150, priceDollarsPerTon: 255, status: 'listed' },
  { farm: 'whistling-teal', profile: 'alfalfa', field: 'Pivot 3', cutting: 3, baleType: 'large_square_4x4x8', baleWeightLb: 1700, bales: 140, priceDollarsPerTon: 265, status: 'listed' },
  { farm: 'whistling-teal', profile: 'mix', field: 'Dry Corner', cutting: 1, baleType: 'round_5x6', baleWeightLb: 1850, bales: 95, priceDollarsPerTon: 165, status: 'listed' },
  { farm: 'whistling-teal', profile: 'mix', field: 'Dry Corner', cutting: 2, baleType: 'round_5x6', baleWeightLb: 1900, bales: 80, priceDollarsPerTon: 170, status: 'listed' },
  { farm: 'whistling-teal', profile: 'alfalfa', field: 'Pivot 5', cutting: 4, baleType: 'round_4x5', baleWeightLb: 1000, bales: 70, priceDollarsPerTon: 210, status: 'in_review' },
  { farm: 'copperleaf', profile: 'bermudagrass', field: 'Home Place', cutting: 1, baleType: SMALL2, baleWeightLb: 52, bales: 1300, priceDollarsPerTon: 280, status: 'listed' },
  { farm: 'copperleaf', profile: 'bermudagrass', field: 'Home Place', cutting: 2, baleType: SMALL2, baleWeightLb: 50, bales: 1250, priceDollarsPerTon: 295, status: 'listed' },
  { farm: 'copperleaf', profile: 'grassMix', field: 'Back Forty', cutting: 1, baleType: SMALL2, baleWeightLb: 48, bales: 900, priceDollarsPerTon: 250, status: 'listed' },
  { farm: 'copperleaf', profile: 'bermudagrass', field: 'Pecan Row', cutting: 3, baleType: 'round_4x4', baleWeightLb: 520, bales: 160, priceDollarsPerTon: 140, status: 'listed' },
  { farm: 'copperleaf', profile: 'grassMix', field: 'Back Forty', cutting: 2, baleType: 'round_4x5', baleWeightLb: 900, bales: 60, priceDollarsPerTon: 130, status: 'listed' },
  { farm: 'oxbow', profile: 'teff', field: 'Low Meadow', cutting: 1, baleType: SMALL2, baleWeightLb: 57, bales: 1000, priceDollarsPerTon: 320, status: 'listed' },
  { farm: 'oxbow', profile: 'timothy', field: 'Low Meadow', cutting: 2, baleType: SMALL2, baleWeightLb: 59, bales: 800, priceDollarsPerTon: 340, status: 'listed' },
  { farm: 'oxbow', profile: 'orchardgrass', field: 'Windmill', cutting: 1, baleType: SMALL3, baleWeightLb: 98, bales: 600, priceDollarsPerTon: 300, status: 'listed' },
  { farm: 'oxbow', profile: 'grassMix', field: 'Windmill', cutting: 2, baleType: 'large_square_3x3x8', baleWeightLb: 850, bales: 85, priceDollarsPerTon: 215, status: 'listed' },
  { farm: 'oxbow', profile: 'bromegrass', field: 'Section 9', cutting: 1, baleType: 'round_5x5', baleWeightLb: 1300, bales: 100, priceDollarsPerTon: 145, status: 'listed' },
  { farm: 'oxbow', profile: 'teff', field: 'Section 9', cutting: 2, baleType: SMALL2, baleWeightLb: 54, bales: 700, priceDollarsPerTon: 310, status: 'in_review' },
  { farm: 'larkspur', profile: 'alfalfa', field: 'River Forty', cutting: 4, baleType: SMALL2, baleWeightLb: 65, bales: 750, priceDollarsPerTon: 320, status: 'listed' },
];
