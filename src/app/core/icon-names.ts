/**
 * Every Material Symbols icon the app shows. The browser gets a font holding only these
 * (public/fonts/material-symbols-subset.woff2, made by scripts/icons/subset-icons.py): an icon missing here
 * would show as its name in letters. icon-names.spec.ts checks the templates against this list.
 */
export const ICON_NAMES = [
  'account_circle', 'add', 'add_photo_alternate', 'agriculture', 'arrow_back', 'arrow_forward', 'attach_file',
  'calculate', 'check', 'check_circle', 'delete', 'download', 'error', 'fact_check', 'hourglass_top', 'info',
  'inventory_2', 'logout', 'picture_as_pdf', 'search', 'shopping_cart', 'upload_file', 'warning',
] as const;
