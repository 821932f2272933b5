import { LOT_STATUS_LABELS } from './labels';

/** One changed field of an audit row, in words: what it is, what it was, what it became. */
export interface AuditChange {
  field: string;
  label: string;
  from: string;
  to: string;
}

const FIELD_LABELS: Record<string, string> = {
  status: 'Status',
  analysisVerification: 'Lab analysis',
  reviewNote: 'Note to the grower',
  publishedAt: 'First listed',
  role: 'Role',
  suspendedAt: 'Suspended',
  refundedCents: 'Refunded (cents)',
};

const ANALYSIS_WORDS: Record<string, string> = { pending: 'not yet checked', verified: 'checked against the report', rejected: 'sent back' };

function words(entityType: string, field: string, value: unknown): string {
  if (value === null || value === undefined || value === '') return '—';
  if (entityType === 'lot' && field === 'status' && typeof value === 'string') return (LOT_STATUS_LABELS as Record<string, string>)[value] ?? value;
  if (field === 'analysisVerification' && typeof value === 'string') return ANALYSIS_WORDS[value] ?? value;
  if (typeof value === 'string' && /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}/.test(value)) return `${value.slice(0, 16).replace('T', ' ')} UTC`;
  return typeof value === 'object' ? JSON.stringify(value) : String(value);
}

/**
 * The fields an audit row changed, from → to, in words (lot states by their names, times in UTC).
 * Fields present on only one side count as changed; fields equal on both sides are left out.
 */
export function auditChanges(entityType: string, before: unknown, after: unknown): AuditChange[] {
  const b = (before && typeof before === 'object' ? before : {}) as Record<string, unknown>;
  const a = (after && typeof after === 'object' ? after : {}) as Record<string, unknown>;
  const fields = [...new Set([...Object.keys(b), ...Object.keys(a)])];
  return fields
    .filter((f) => JSON.stringify(b[f] ?? null) !== JSON.stringify(a[f] ?? null))
    .map((field) => ({ field, label: FIELD_LABELS[field] ?? field, from: words(entityType, field, b[field]), to: words(entityType, field, a[field]) }));
}

/** The changes as one line, e.g. "Status: Listed → Paused". */
export function auditChangesLine(changes: AuditChange[]): string {
  return changes.map((c) => `${c.label}: ${c.from} → ${c.to}`).join('; ');
}
