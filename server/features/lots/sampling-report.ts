import { isDeepStrictEqual } from 'node:util';
import { and, asc, eq, gt, inArray, sql } from 'drizzle-orm';
import type { Finding, SamplingEvaluation } from '@shared/forage';
import { samplingVerdictOf } from '@shared/forage/sampling-verdict';
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

const PAGE = 500;

/**
 * Brings every stored verdict up to today's rules: a row stored before a rule changed keeps its old verdict
 * until one of its inputs changes, and the catalogue filter (which reads the stored verdict) would then
 * disagree with what the rules say. Only rows whose verdict differs are written, a page per transaction, so a
 * run over an up-to-date table writes nothing. `lotIds` limits the run to those lots. Returns how many changed.
 */
export async function refreshStoredSamplingVerdicts(db: Db, now: Date, lotIds?: number[]): Promise<number> {
  let changed = 0;
  let after = 0;
  for (;;) {
    // One transaction per page: each committed write empties every server's catalogue cache (the
    // catalogue_changed notice), and a notice repeated in one transaction is delivered once. The page's
    // records are locked while judged, so a grower's edit in between waits and then stores its own verdict.
    const page = await db.transaction(async (tx) => {
      const rows = await tx
        .select({ s: samplingRecords, lot: lots })
        .from(samplingRecords)
        .innerJoin(lots, eq(lots.id, samplingRecords.lotId))
        .where(and(gt(samplingRecords.id, after), lotIds ? inArray(samplingRecords.lotId, lotIds) : undefined))
        .orderBy(asc(samplingRecords.id))
        .limit(PAGE)
        .for('update', { of: samplingRecords });
      for (const { s, lot } of rows) {
        const verdict = samplingVerdictOf(lot, s, now);
        // Compared as values: PostgreSQL's jsonb keeps object keys in its own order.
        if (verdict.compliant === s.compliant && isDeepStrictEqual(verdict.findings, s.findings)) continue;
        await tx.update(samplingRecords).set({ compliant: verdict.compliant, findings: verdict.findings, updatedAt: now }).where(eq(samplingRecords.id, s.id));
        changed += 1;
      }
      return rows;
    });
    if (page.length < PAGE) return changed;
    after = page[page.length - 1]!.s.id;
  }
}
