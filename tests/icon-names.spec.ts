import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { ICON_NAMES } from '../src/app/core/icon-names';
import { ICON_PATHS } from '../src/app/shared/ui/icon-paths';
import { publishedIconPath } from '../scripts/icons/published-icon-path';

const root = join(__dirname, '..');

function filesUnder(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? filesUnder(path) : /\.(html|ts)$/.test(name) && !name.endsWith('.spec.ts') ? [path] : [];
  });
}

/** Icon names the app can show: `<app-icon name="…">`, quoted names in an `[name]` binding, and `icon: '…'` values. */
function iconsUsed(): Map<string, string> {
  const used = new Map<string, string>();
  for (const file of filesUnder(join(root, 'src/app'))) {
    const text = readFileSync(file, 'utf8');
    for (const m of text.matchAll(/<app-icon\s+name="([^"]*)"/g)) used.set(m[1]!, file);
    for (const m of text.matchAll(/<app-icon\s+\[name\]="([^"]*)"/g)) for (const q of m[1]!.matchAll(/'([a-z0-9_]+)'/g)) used.set(q[1]!, file);
    for (const m of text.matchAll(/\bicon: '([a-z0-9_]+)'/g)) used.set(m[1]!, file);
    for (const m of text.matchAll(/const ICONS = \{([^}]*)\}/g)) for (const q of m[1]!.matchAll(/: '([a-z0-9_]+)'/g)) used.set(q[1]!, file);
  }
  return used;
}

describe('icons (Material Symbols Outlined, weight 400, as @material-symbols/svg-400 publishes them)', () => {
  it('lists every icon the templates show', () => {
    const used = iconsUsed();
    expect(used.size).toBeGreaterThan(10); // the scan found the templates' icons
    const missing = [...used].filter(([name]) => !(ICON_NAMES as readonly string[]).includes(name)).map(([name, file]) => `${name} (${file})`);
    expect(missing).toEqual([]);
  });

  it('draws each listed icon exactly as the published icon set does', () => {
    for (const name of ICON_NAMES) expect([name, ICON_PATHS[name]]).toEqual([name, publishedIconPath(name)]);
  });

  it('leaves no Material icon-font element in a template (it would show its name in letters without the font)', () => {
    const left = filesUnder(join(root, 'src/app')).filter((file) => /<mat-icon[\s>]/.test(readFileSync(file, 'utf8')));
    expect(left).toEqual([]);
  });
});
