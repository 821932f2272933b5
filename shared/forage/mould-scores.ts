/** What a grower saw of mould when bales were opened, least first (findings in ./mould.ts). */
export const VISUAL_MOULD_SCORES = ['none', 'slight', 'moderate', 'heavy'] as const;
export type VisualMouldScore = (typeof VISUAL_MOULD_SCORES)[number];

export const VISUAL_MOULD_LABELS: Record<VisualMouldScore, string> = {
  none: 'None seen',
  slight: 'Slight: a few spots or a little white dust in some flakes',
  moderate: 'Moderate: musty smell, mould in several flakes',
  heavy: 'Heavy: mouldy flakes through the bales, clouds of dust',
};
