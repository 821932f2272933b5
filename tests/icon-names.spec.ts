import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { ICON_NAMES } from '../src/app/core/icon-names';

const root = join(__dirname, '..');

function filesUnder(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? filesUnder(path) : /\.(html|ts)$/.test(name) && !name.endsWith('.spec.ts') ? [path] : [];
  });
}

/** Icon names the app can show: literal <mat-icon> contents, quoted names inside one, and `icon: '…'` values. */
function iconsUsed(): Map<string, string> {
  const used = new Map<string, string>();
  for (const file of filesUnder(join(root, 'src/app'))) {
    const text = readFileSync(file, 'utf8');
    for (const m of text.matchAll(/<mat-icon[^>]*>([^<]*)<\/mat-icon>/g)) {
      const content = m[1]!.trim();
      const names = content.startsWith('{{') ? [...content.matchAll(/'([a-z0-9_]+)'/g)].map((q) => q[1]!) : [content];
      for (const name of names) used.set(name, file);
    }
    for (const m of text.matchAll(/\bicon: '([a-z0-9_]+)'/g)) used.set(m[1]!, file);
    for (const m of text.matchAll(/const ICONS = \{([^}]*)\}/g)) for (const q of m[1]!.matchAll(/: '([a-z0-9_]+)'/g)) used.set(q[1]!, file);
  }
  return used;
}

describe('icon font subset (common practice: ship only the glyphs used)', () => {
  it('holds every icon the templates show, so none falls back to its name in letters', () => {
    const missing = [...iconsUsed()].filter(([name]) => !(ICON_NAMES as readonly string[]).includes(name)).map(([name, file]) => `${name} (${file})`);
    expect(missing).toEqual([]);
  });

  it('is a small font file, not the whole 4 MB set', () => {
    const size = statSync(join(root, 'public/fonts/material-symbols-subset.woff2')).size;
    expect(size).toBeGreaterThan(1_000);
    expect(size).toBeLessThan(60_000);
  });
});
