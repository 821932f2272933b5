/**
 * Writes a brotli (.br, quality 11) and a gzip (.gz, level 9) copy beside every compressible file of the
 * browser build, so the server sends static files compressed once at build time, smaller than the fast
 * on-the-fly compression can (express-static-gzip picks the copy the browser accepts).
 * Usage: node --import tsx scripts/build/precompress.ts [folder]   (default dist/baleproof/browser)
 */
import { readdir, readFile, stat, writeFile } from 'node:fs/promises';
import { extname, join } from 'node:path';
import { promisify } from 'node:util';
import { brotliCompress, constants, gzip } from 'node:zlib';

const COMPRESSIBLE = new Set(['.js', '.mjs', '.css', '.html', '.svg', '.json', '.txt', '.webmanifest', '.ico']);
const SMALLEST = 1024;
const brotli = promisify(brotliCompress);
const gz = promisify(gzip);

async function* files(folder: string): AsyncGenerator<string> {
  for (const entry of await readdir(folder, { withFileTypes: true })) {
    const path = join(folder, entry.name);
    if (entry.isDirectory()) yield* files(path);
    else if (COMPRESSIBLE.has(extname(entry.name))) yield path;
  }
}

async function precompress(folder: string): Promise<void> {
  let count = 0;
  let before = 0;
  let after = 0;
  for await (const path of files(folder)) {
    if ((await stat(path)).size < SMALLEST) continue;
    const body = await readFile(path);
    const [br, gzipped] = await Promise.all([
      brotli(body, { params: { [constants.BROTLI_PARAM_QUALITY]: constants.BROTLI_MAX_QUALITY, [constants.BROTLI_PARAM_SIZE_HINT]: body.length } }),
      gz(body, { level: constants.Z_BEST_COMPRESSION }),
    ]);
    await Promise.all([writeFile(`${path}.br`, br), writeFile(`${path}.gz`, gzipped)]);
    count++;
    before += body.length;
    after += br.length;
  }
  console.log(`precompressed ${count} files: ${(before / 1024).toFixed(0)} kB → ${(after / 1024).toFixed(0)} kB as brotli`);
}

precompress(process.argv[2] ?? 'dist/baleproof/browser').catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
