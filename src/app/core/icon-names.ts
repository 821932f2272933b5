/**
 * Every Material Symbols icon the app shows, drawn as inline SVG by `<app-icon>` (shared/ui/icon.ts) from the
 * paths in shared/ui/icon-paths.ts (made by scripts/icons/make-icon-paths.ts). tests/icon-names.spec.ts checks the
 * templates against this list and the paths against the published icon set.
 */
export const ICON_NAMES = [
  'account_circle', 'add', 'add_photo_alternate', 'agriculture', 'arrow_back', 'arrow_forward', 'attach_file',
  'calculate', 'check', 'check_circle', 'delete', 'download', 'error', 'fact_check', 'hourglass_top', 'info',
  'inventory_2', 'logout', 'picture_as_pdf', 'search', 'shopping_cart', 'upload_file', 'warning',
] as const;
export type IconName = (typeof ICON_NAMES)[number];
