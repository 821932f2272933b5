import { Worker } from 'node:worker_threads';
import type { TextItem } from '@shared/lab-report/read-report-text';

export type PdfTextResult = { ok: true; pages: number; items: TextItem[] } | { ok: false; reason: 'encrypted' | 'invalid' | 'timeout' | 'failed'; message: string };

/*
 * pdfjs-dist (legacy build for Node) runs in a worker thread: it is an ES module the CommonJS test runner
 * cannot load, and a hostile or broken PDF can only stall the worker, which is stopped after `timeoutMs`.
 */
const WORKER_SOURCE = `
const { parentPort, workerData } = require('node:worker_threads');
const { createRequire } = require('node:module');
const { pathToFileURL } = require('node:url');
(async () => {
  const from = createRequire(workerData.base);
  const load = (name) => import(pathToFileURL(from.resolve(name)).href);
  const pdfjs = await load('pdfjs-dist/legacy/build/pdf.mjs');
  globalThis.pdfjsWorker = await load('pdfjs-dist/legacy/build/pdf.worker.mjs');
  const task = pdfjs.getDocument({ data: workerData.data, verbosity: 0, isEvalSupported: false, disableFontFace: true, useSystemFonts: false, stopAtErrors: false });
  const doc = await task.promise;
  const items = [];
  const pages = Math.min(doc.numPages, workerData.maxPages);
  for (let p = 1; p <= pages; p++) {
    const page = await doc.getPage(p);
    const content = await page.getTextContent();
    for (const it of content.items) {
      if (typeof it.str === 'string' && it.str.trim() !== '') items.push({ str: it.str, x: it.transform[4], y: it.transform[5], width: it.width, page: p });
    }
  }
  parentPort.postMessage({ ok: true, pages: doc.numPages, items });
  await task.destroy();
})().catch((e) => parentPort.postMessage({ ok: false, name: (e && e.name) || 'Error', message: String((e && e.message) || e) }));
`;


/** The text runs of a PDF's first `maxPages` pages, with their positions. */
export function extractPdfText(pdf: Buffer, options: { maxPages?: number; timeoutMs?: number } = {}): Promise<PdfTextResult> {
  const data = new Uint8Array(pdf);
  return new Promise((resolve) => {
    const worker = new Worker(WORKER_SOURCE, { eval: true, workerData: { base: `${process.cwd()}/`, data, maxPages: options.maxPages ?? 6 } });
    const timer = setTimeout(() => {
      void worker.terminate();
      resolve({ ok: false, reason: 'timeout', message: 'Reading the PDF took too long.' });
    }, options.timeoutMs ?? 15_000);
    const finish = (result: PdfTextResult) => {
      clearTimeout(timer);
      void worker.terminate();
      resolve(result);
    };
    worker.once('message', (m: { ok: true; pages: number; items: TextItem[] } | { ok: false; name: string; message: string }) => {
      if (m.ok) finish(m);
      else finish({ ok: false, reason: m.name === 'PasswordException' ? 'encrypted' : m.name === 'InvalidPDFException' ? 'invalid' : 'failed', message: m.message });
    });
    worker.once('error', (err) => finish({ ok: false, reason: 'failed', message: err.message }));
  });
}
