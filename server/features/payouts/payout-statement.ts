import Papa from 'papaparse';
import type { PayoutView } from '@shared/contracts/payouts';
import { centsToDecimalText as dollars } from '@shared/units/money';

/**
 * A grower's statement as CSV: one row per order paid (refunds to the buyer already taken off), under the payout that carried
 * it, amounts in dollars with two decimals (spreadsheets read them as numbers).
 */
export function payoutStatementCsv(farmName: string, payouts: PayoutView[]): string {
  const rows: Record<string, string | number>[] = [];
  for (const p of [...payouts].reverse()) {
    for (const l of p.lines) {
      rows.push({ payout: p.id, status: p.statusLabel, sent: p.sentAt?.slice(0, 10) ?? '', order: l.orderId, item: 'order', hay: dollars(l.goodsCents), freight: dollars(l.freightCents), refunded: dollars(l.refundedCents), amount: dollars(l.amountCents), transfer: p.transferId ?? '' });
    }
  }
  const body = Papa.unparse(rows, { columns: ['payout', 'status', 'sent', 'order', 'item', 'hay', 'freight', 'refunded', 'amount', 'transfer'], newline: '\r\n' });
  return `${Papa.unparse([[`Payout statement: ${farmName}`]])}\r\n${body}\r\n`;
}
