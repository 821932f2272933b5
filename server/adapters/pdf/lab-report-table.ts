import type { AnalysisColumns } from '../../features/lots/analysis-record';

export type PrintedAnalysis = Pick<AnalysisColumns, 'dryMatterPct' | 'crudeProteinPct' | 'adfPct' | 'ndfPct' | 'ndfd48Pct' | 'fatPct' | 'ashPct' | 'escPct' | 'wscPct' | 'starchPct' | 'calciumPct' | 'phosphorusPct'> &
  Partial<Pick<AnalysisColumns, 'nitrateNo3PctDm' | 'mouldCfuPerG' | 'aflatoxinPpb' | 'donPpm' | 'fumonisinPpm'>>;

/**
 * The results of an invented lab report laid out as forage labs commonly print them (common practice): an
 * as-fed and a dry-matter column for the nutrients, then nitrate, mould and mycotoxins in the lab's own units
 * when given. For the demo's reports and test fixtures (each adds its own heading); never a real lab's form.
 */
export function labReportTableLines(c: PrintedAnalysis): string[] {
  const v = (x: number | null | undefined, digits = 1) => (x == null ? 'n/a' : x.toFixed(digits));
  const asFed = (x: number) => v((x * c.dryMatterPct) / 100);
  const lines = [
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
  ];
  const safety = [
    c.nitrateNo3PctDm != null && `Nitrate (NO3), %                            ${v(c.nitrateNo3PctDm, 2)}`,
    c.mouldCfuPerG != null && `Mold count, CFU/g                           ${c.mouldCfuPerG.toLocaleString('en-US')}`,
    c.aflatoxinPpb != null && `Aflatoxin, ppb                              ${v(c.aflatoxinPpb)}`,
    c.donPpm != null && `DON (vomitoxin), ppm                        ${v(c.donPpm, 2)}`,
    c.fumonisinPpm != null && `Fumonisin, ppm                              ${v(c.fumonisinPpm, 2)}`,
  ].filter((l): l is string => typeof l === 'string');
  return safety.length > 0 ? [...lines, '', 'Safety (dry matter basis)', ...safety] : lines;
}
