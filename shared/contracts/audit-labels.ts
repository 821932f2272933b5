/**
 * Audit actions in words, for history lists and the audit page. An action without a label here is
 * shown by its code, so a new action is never hidden.
 */
export const AUDIT_ACTION_LABELS: Record<string, string> = {
  'lot.submitted': 'Submitted for review',
  'lot.approved': 'Approved and listed',
  'lot.returned': 'Returned to the grower',
  'lot.withdrawn': 'Taken off sale',
  'lot.relisted': 'Put back on sale',
  'user.signed_up': 'Signed up',
  'user.email_confirmed': 'E-mail address confirmed',
  'user.role_changed': 'Role changed',
  'user.suspended': 'Suspended',
  'user.reinstated': 'Reinstated',
  'settings.changed': 'Settings changed',
  'payout.sent': 'Payout sent',
  'payout.held': 'Payout held',
  'payout.failed': 'Payout failed',
  'claim.opened': 'Quality claim opened',
  'claim.resolved': 'Quality claim resolved',
  'refund.issued': 'Refund issued',
};

export function auditActionLabel(action: string): string {
  return AUDIT_ACTION_LABELS[action] ?? action;
}
