import { execFile } from 'node:child_process';
import { join } from 'node:path';
import { promisify } from 'node:util';
import type { Result } from 'lighthouse';

const execFileAsync = promisify(execFile);

export interface LighthouseRun {
  score: number;
  fcpMs: number;
  lcpMs: number;
  tbtMs: number;
  cls: number;
  speedIndexMs: number;
  serverResponseMs: number;
  /** Lighthouse's own measure of how fast this machine ran at the time (about 1,000–2,000 on a desktop). */
  benchmarkIndex: number;
}

/**
 * Lighthouse's Performance score for each of `pages` with its default (mobile) settings: a phone-sized
 * screen, simulated slow 4G and a 4× CPU slowdown worked out from the unthrottled load. Each run starts a fresh
 * headless Chromium (Debian's, or `CHROMIUM_PATH`), so nothing is cached between runs. The pages are scored in
 * turn (a, b, a, b, …) so a change in the machine's load weighs on all of them alike. The score moves from
 * run to run, most with the machine's load, so the bench reports every run and the median.
 */
export async function lighthouseRuns<K extends string>(pages: Record<K, LighthousePage>, runs: number): Promise<Record<K, LighthouseRun[]>> {
  const out = Object.fromEntries(Object.keys(pages).map((k) => [k, [] as LighthouseRun[]])) as Record<K, LighthouseRun[]>;
  for (let i = 0; i < runs; i++) {
    for (const [key, page] of Object.entries(pages) as [K, LighthousePage][]) out[key].push(summarise(await runOnce(page)));
  }
  return out;
}

export interface LighthousePage {
  url: string;
  /** Requests the browser refuses (Lighthouse's `--blocked-url-patterns`), e.g. `*.js` to score the server's HTML alone. */
  blocked?: string[];
}

/**
 * One run of Lighthouse's command line in its own process: Lighthouse sends functions to the page as source
 * text, so it must run untransformed (tsx's helpers would go with them and be missing in the page).
 */
async function runOnce({ url, blocked = [] }: LighthousePage): Promise<Result> {
  const bin = join(import.meta.dirname, '../../node_modules/lighthouse/cli/index.js');
  const { stdout } = await execFileAsync(
    process.execPath,
    [bin, url, ...blocked.map((b) => `--blocked-url-patterns=${b}`), '--only-categories=performance', '--output=json', '--output-path=stdout', '--quiet', '--chrome-flags=--headless=new --no-sandbox --disable-gpu'],
    { env: { ...process.env, CHROME_PATH: process.env['CHROMIUM_PATH'] ?? '/usr/bin/chromium' }, maxBuffer: 64 * 1024 * 1024 },
  );
  const lhr = JSON.parse(stdout) as Result;
  if (lhr.runtimeError) throw new Error(`Lighthouse: ${lhr.runtimeError.message}`);
  return lhr;
}

function summarise(lhr: Result): LighthouseRun {
  const audit = (id: string): number => Number(lhr.audits[id]?.numericValue ?? NaN);
  return {
    score: Math.round((lhr.categories['performance']?.score ?? 0) * 100),
    fcpMs: audit('first-contentful-paint'),
    lcpMs: audit('largest-contentful-paint'),
    tbtMs: audit('total-blocking-time'),
    cls: audit('cumulative-layout-shift'),
    speedIndexMs: audit('speed-index'),
    serverResponseMs: audit('server-response-time'),
    benchmarkIndex: lhr.environment.benchmarkIndex,
  };
}

export function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}
