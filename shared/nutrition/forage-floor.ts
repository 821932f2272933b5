/**
 * Forage floor: the least forage dry matter a horse should eat a day, as % of body weight.
 *
 * - Default 1.5 % BW as DM: NRC (2007) Nutrient Requirements of Horses advises at least 1–1.5 % of body
 *   weight a day as forage dry matter (from memory, the commonly quoted reading); Lawrence, Virginia Tech
 *   Ext. 406-473 Table 5 gives 1.5–2.0 % BW forage for mature horses at maintenance.
 * - Lowest accepted 1.0 % BW: not below 1 % BW DM, and only under veterinary supervision (Vet Times 2018,
 *   domain brief S14); the same Virginia Tech table goes down to 1.0 % for working and lactating horses
 *   fed concentrate.
 * - Highest accepted 2.0 % BW: the top of the maintenance forage band (Virginia Tech Table 5) and the
 *   typical intake the herd planner feeds, so a floor never exceeds what the horses can eat (2.5 %).
 */
export const FORAGE_FLOOR_PCT_BW = { default: 1.5, min: 1.0, max: 2.0 } as const;

