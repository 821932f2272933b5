import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';

const require = createRequire(import.meta.url);

/** The path of one Material Symbols Outlined icon (weight 400, unfilled) as @material-symbols/svg-400 publishes it. */
export function publishedIconPath(name: string): string {
  const svg = readFileSync(require.resolve(`@material-symbols/svg-400/outlined/${name}.svg`), 'utf8');
  if (!svg.includes('viewBox="0 -960 960 960"')) throw new Error(`${name}: unexpected viewBox`);
  const paths = [...svg.matchAll(/<path d="([^"]+)"/g)].map((m) => m[1]!);
  if (paths.length !== 1) throw new Error(`${name}: expected one path, found ${paths.length}`);
  return paths[0]!;
}
