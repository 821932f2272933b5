import { eq, sql } from 'drizzle-orm';
import type { Finding, SamplingEvaluation } from '@shared/forage';
import { samplingVerdictOf } from '@shared/contracts/sampling-record';
import type { Db } from '../../db/client';
import { lots, samplingRecords } from '../../db/schema';

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

/** The stored sampling verdict, as every page and the catalogue filter read it. */
export function storedSamplingVerdict(s: Pick<typeof samplingRecords.$inferSelect, 'compliant' | 'findings'>): SamplingEvaluation {
  return { compliant: s.compliant, findings: s.findings as Finding[] };
}

/**
 * Recomputes and stores a lot's sampling verdict (see `samplingVerdictOf`); called in the transaction
 * of every change to one of its inputs: the sampling facts, the lot's harvest dates, bale shape or
 * size, and its first listing.
 */
export async function refreshSamplingVerdict(tx: Tx | Db, lotId: number, now: Date): Promise<void> {
  const [row] = await tx.select({ s: samplingRecords, lot: lots }).from(samplingRecords).innerJoin(lots, eq(lots.id, samplingRecords.lotId)).where(eq(samplingRecords.lotId, lotId));
  if (!row) return;
  const verdict = samplingVerdictOf(row.lot, row.s, now);
  await tx.update(samplingRecords).set({ compliant: verdict.compliant, findings: verdict.findings, updatedAt: sql`now()` }).where(eq(samplingRecords.id, row.s.id));
}
