import type { AnalysisColumns } from '../../server/features/lots/analysis-record';
import { simplePdf } from './simple-pdf';

type Values = Pick<AnalysisColumns, 'dryMatterPct' | 'crudeProteinPct' | 'adfPct' | 'ndfPct' | 'ndfd48Pct' | 'fatPct' | 'ashPct' | 'escPct' | 'wscPct' | 'starchPct' | 'calciumPct' | 'phosphorusPct' | 'nitrateNo3PctDm' | 'mouldCfuPerG' | 'aflatoxinPpb' | 'donPpm' | 'fumonisinPpm'>;

/**
 * An invented lab report (no real lab) laid out as forage labs commonly print one: an as-fed and a
 * dry-matter column for the nutrients, then nitrate, mould and mycotoxins in the lab's own units.
 */
export function labReportPdf(c: Values): Promise<Buffer> {
  const v = (x: number | null, digits = 1) => (x === null ? 'n/a' : x.toFixed(digits));
  const asFed = (x: number) => v((x * c.dryMatterPct) / 100);
  return simplePdf([
    'Invented Test Forage Lab - FORAGE ANALYSIS REPORT',
    'Report T-1    Sample: hay, composite of cores',
    '',
    'Component                      As fed     Dry matter',
    `Dry matter, %                 ${v(c.dryMatterPct)}      100.0`,
    `Crude protein, %              ${asFed(c.crudeProteinPct)}       ${v(c.crudeProteinPct)}`,
    `ADF, %                        ${asFed(c.adfPct)}       ${v(c.adfPct)}`,
    `NDF, %                        ${asFed(c.ndfPct)}       ${v(c.ndfPct)}`,
    `NDFD 48 h, % of NDF                      ${v(c.ndfd48Pct)}`,
    `Crude fat, %                                ${v(c.fatPct)}`,
    `Ash, %                                      ${v(c.ashPct)}`,
    `ESC, %                                      ${v(c.escPct)}`,
    `WSC, %                                      ${v(c.wscPct)}`,
    `Starch, %                                   ${v(c.starchPct)}`,
    `Calcium, %                                  ${v(c.calciumPct, 2)}`,
    `Phosphorus, %                               ${v(c.phosphorusPct, 2)}`,
    '',
    'Safety (dry matter basis)',
    `Nitrate (NO3), %                            ${v(c.nitrateNo3PctDm, 2)}`,
    `Mold count, CFU/g                           ${c.mouldCfuPerG === null ? 'n/a' : c.mouldCfuPerG.toLocaleString('en-US')}`,
    `Aflatoxin, ppb                              ${v(c.aflatoxinPpb)}`,
    `DON (vomitoxin), ppm                        ${v(c.donPpm, 2)}`,
    `Fumonisin, ppm                              ${v(c.fumonisinPpm, 2)}`,
  ]);
}
