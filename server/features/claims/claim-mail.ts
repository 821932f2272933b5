import type { OutgoingMail } from '../../adapters/mail/mailer';
import type { ClaimView } from '@shared/contracts/claims';
import { formatCents } from '@shared/units/money';

/** Both sides hear that a problem was reported. */
export function claimOpenedMail(to: string, role: 'buyer' | 'grower', c: ClaimView, publicUrl: string): OutgoingMail {
  const intro = role === 'buyer' ? `We received your report about order ${c.orderId} (“${c.lotTitle}”).` : `The buyer of order ${c.orderId} (“${c.lotTitle}”) reported a problem with the hay.`;
  return {
    to,
    subject: `Problem reported: order ${c.orderId}`,
    text: `${intro}\n\nWhat was reported:\n${c.reason}\n\nAn admin will compare ${c.retest ? `the retest from ${c.retest.labName}` : 'the report'} with the listed analysis and write to you both.\n\nOrder: ${publicUrl}/orders/${c.orderId}\n\n— Baleproof`,
  };
}

/** Both sides hear the decision, the refund and what it means for the grower's payout. */
export function claimDecidedMail(to: string, role: 'buyer' | 'grower', c: ClaimView, publicUrl: string): OutgoingMail {
  const outcome = c.refundCents === 0 ? 'no refund' : c.refundableCents === 0 ? `a full refund of ${formatCents(c.refundCents)}` : `a partial refund of ${formatCents(c.refundCents)}`;
  const effect =
    role === 'buyer'
      ? c.refundCents > 0 ? `The refund goes back to the card you paid with; banks usually show it within 5–10 days.` : ''
      : c.refundCents > 0 ? `The refund is taken from your payout for this order (or from your next payout if it was already paid).` : 'Your payout for this order is unchanged.';
  return {
    to,
    subject: `Claim decided: order ${c.orderId}`,
    text: `The claim on order ${c.orderId} (“${c.lotTitle}”) is decided: ${outcome}.\n\nThe admin wrote:\n${c.resolution ?? ''}\n\n${effect}\n\nOrder: ${publicUrl}/orders/${c.orderId}\n\n— Baleproof`,
  };
}
