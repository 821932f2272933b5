import { auditChanges, auditChangesLine } from './audit-changes';

describe('audit changes in words', () => {
  it('names a lot’s states as the grower sees them (labels.ts) and leaves out what did not change', () => {
    const changes = auditChanges('lot', { status: 'listed', title: 'Second cut' }, { status: 'withdrawn', title: 'Second cut' });
    expect(auditChangesLine(changes)).toBe('Status: Listed → Paused');
  });

  it('shows a field present on one side only as from or to nothing, and a time in UTC to the minute', () => {
    const changes = auditChanges('lot', { status: 'in_review', reviewNote: null, publishedAt: null }, { status: 'listed', analysisVerification: 'verified', publishedAt: '2026-09-15T14:05:09.000Z' });
    expect(changes).toEqual([
      { field: 'status', label: 'Status', from: 'With the reviewer', to: 'Listed' },
      { field: 'publishedAt', label: 'First listed', from: '—', to: '2026-09-15 14:05 UTC' },
      { field: 'analysisVerification', label: 'Lab analysis', from: '—', to: 'checked against the report' },
    ]);
  });

  it('shows an unknown field by its code and a value of another entity as stored, so nothing is hidden', () => {
    expect(auditChanges('payout', { status: 'due', weight: 3 }, { status: 'sent', weight: 4 })).toEqual([
      { field: 'status', label: 'Status', from: 'due', to: 'sent' },
      { field: 'weight', label: 'weight', from: '3', to: '4' },
    ]);
    expect(auditChanges('user', null, undefined)).toEqual([]);
  });
});
