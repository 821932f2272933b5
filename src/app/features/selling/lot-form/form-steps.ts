import { LOT_FORM_STEPS as SAVED_STEPS } from '@shared/contracts/selling';

type StepKey = (typeof SAVED_STEPS)[number] | 'review';

const NAMES: Record<StepKey, string> = {
  lot: 'Field and harvest',
  quantity: 'Bales and stock',
  sampling: 'Core sample',
  analysis: 'Lab report',
  photos: 'Photos of the stack',
  price: 'Price and hauling',
  review: 'Check and send',
};

/** The lot form's steps in the trade's words: every saved step, then sending the lot to the reviewer. */
export const LOT_FORM_STEPS: { key: StepKey; name: string }[] = [...SAVED_STEPS, 'review' as const].map((key) => ({ key, name: NAMES[key] }));

/** How far a draft has got, in words: `draftStep` counts the saved steps (the last step is sending, not saving). */
export function draftProgress(draftStep: number): string {
  const saved = Math.min(Math.max(draftStep, 0), LOT_FORM_STEPS.length - 1);
  return `${saved} of ${LOT_FORM_STEPS.length} steps done · next: ${LOT_FORM_STEPS[saved]!.name}`;
}
