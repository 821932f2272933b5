/**
 * Writes src/app/shared/ui/icon-paths.ts: the drawing (SVG path) of every icon named in src/app/core/icon-names.ts,
 * taken from Google's Material Symbols (Outlined, weight 400) as the @material-symbols/svg-400 package ships them.
 * The app draws its icons as inline SVG, so a page loads no icon font and lays its text out once.
 * Run after adding a name to icon-names.ts:  node --import tsx scripts/icons/make-icon-paths.ts
 */
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { ICON_NAMES } from '../../src/app/core/icon-names';
import { publishedIconPath } from './published-icon-path';

const root = join(import.meta.dirname, '../..');
const lines = ICON_NAMES.map((name) => `  ${name}: '${publishedIconPath(name)}',`);
const out = `// Made by scripts/icons/make-icon-paths.ts from @material-symbols/svg-400 (Apache-2.0); do not edit by hand.
import type { IconName } from '../../core/icon-names';

/** Material Symbols Outlined, weight 400: each icon's path in the viewBox ${'`'}0 -960 960 960${'`'}. */
export const ICON_PATHS: Readonly<Record<IconName, string>> = {
${lines.join('\n')}
};
`;
writeFileSync(join(root, 'src/app/shared/ui/icon-paths.ts'), out);
console.log(`wrote ${ICON_NAMES.length} icon paths`);
