import { readdir } from 'node:fs/promises';
import { eq, inArray } from 'drizzle-orm';
import { PDFDocument } from 'pdf-lib';
import sharp from 'sharp';
import type { FileStorage } from '../../adapters/storage/file-storage';
import { createApi } from '../../api';
import { photos, storedFiles } from '../../db/schema';
import { csrfAgent, startTestApi, type TestApi } from '../../../tests/support/test-api';
import { approveLot, ANALYSIS_STEP, completeLot, LOT_STEP, makeJpeg, makePdf, QUANTITY_STEP, SAMPLING_STEP, signedInGrower, signedInUser } from '../../../tests/support/grower-lot';
import { PDF_MAX_BYTES, PHOTO_MAX_BYTES } from './upload-limits';
import { simplePdf } from '../../../tests/support/simple-pdf';

describe('uploads API', () => {
  let t: TestApi;
  let grower: Awaited<ReturnType<typeof signedInGrower>>;
  let lotId: number;

  beforeAll(async () => {
    t = await startTestApi();
    grower = await signedInGrower(t);
    const created = await grower.agent.post('/selling/lots', LOT_STEP);
    lotId = created.body.id;
    await grower.agent.put(`/selling/lots/${lotId}/quantity`, QUANTITY_STEP);
    await grower.agent.put(`/selling/lots/${lotId}/sampling`, SAMPLING_STEP);
    await grower.agent.put(`/selling/lots/${lotId}/analysis`, ANALYSIS_STEP);
  }, 30_000);
  afterAll(() => t.close());

  const upload = async (field: 'photos' | 'report', files: { data: Buffer; name: string }[], agent = grower.agent, id = lotId) => {
    const token = await agent.token();
    let req = agent.raw.post(`/uploads/lots/${id}/${field === 'photos' ? 'photos' : 'report'}`).set('X-XSRF-TOKEN', token);
    for (const f of files) req = req.attach(field, f.data, f.name);
    return req;
  };
  const photoCount = async () => (await t.deps.db.select().from(photos).where(eq(photos.lotId, lotId))).length;
  /** Stored-file rows owned by this file's grower (other test files upload in parallel under other growers). */
  const growerFileCount = async () => (await t.deps.db.select().from(storedFiles).where(eq(storedFiles.ownerId, grower.user.id))).length;

  it('stores a photo as WebP variants 320/800/1600, upright and without EXIF, and keeps the original', async () => {
    const jpeg = await makeJpeg(2400, 1600);
    const res = await upload('photos', [{ data: jpeg, name: 'barn.jpg' }]);
    expect(res.status).toBe(201);
    const [photo] = res.body.photos;
    expect(photo.variants.map((v: { width: number }) => v.width)).toEqual([320, 800, 1600]);
    // EXIF orientation 6 means "rotate 90°": the stored photo is portrait.
    expect(photo.width).toBe(1600);
    expect(photo.height).toBe(2400);
    expect(photo.isCover).toBe(true);
    const key = photo.variants[1].url.replace('/media/', '');
    const variant = await t.deps.storage.read(key);
    const bytes = await streamToBuffer(variant!.stream);
    const meta = await sharp(bytes).metadata();
    expect(meta.format).toBe('webp');
    expect(meta.exif).toBeUndefined();
    const [row] = await t.deps.db.select().from(photos).where(eq(photos.id, photo.id));
    const [original] = await t.deps.db.select().from(storedFiles).where(eq(storedFiles.id, row!.originalFileId!));
    expect(original).toMatchObject({ mimeType: 'image/jpeg', sizeBytes: jpeg.length, originalName: 'barn.jpg' });
  });

  it('reads a report without keeping it and returns the values to confirm; a scan says it has no text', async () => {
    const token = await grower.agent.token();
    const report = await simplePdf(['Results on a dry matter basis', 'Dry matter  88.5 %', 'Crude protein (CP)  19.4 %', 'ADF  30.2 %', 'NDF  39.9 %']);
    const res = await grower.agent.raw.post('/uploads/report-reading').set('X-XSRF-TOKEN', token).attach('report', report, 'lab.pdf');
    expect(res.status).toBe(200);
    expect(res.body.values).toEqual({ basis: 'dm', dryMatterPct: 88.5, crudeProteinPct: 19.4, adfPct: 30.2, ndfPct: 39.9 });
    expect(res.body.summary).toMatch(/Read 4 values/);
    const blank = await simplePdf([]);
    const scan = await grower.agent.raw.post('/uploads/report-reading').set('X-XSRF-TOKEN', token).attach('report', blank, 'scan.pdf');
    expect(scan.body).toMatchObject({ reading: { status: 'no_text' }, values: null, summary: expect.stringMatching(/no text layer/) });
    const notPdf = await grower.agent.raw.post('/uploads/report-reading').set('X-XSRF-TOKEN', token).attach('report', Buffer.from('hello'), 'x.pdf');
    expect(notPdf.status).toBe(400);
  }, 30_000);

  it('rejects a photo over the size limit with 413 and a clear message', async () => {
    const big = Buffer.alloc(PHOTO_MAX_BYTES + 1024, 1);
    const res = await upload('photos', [{ data: big, name: 'huge.jpg' }]);
    expect(res.status).toBe(413);
    expect(res.body.error).toMatchObject({ code: 'file_too_large' });
    expect(res.body.error.message).toMatch(/15 MB/);
  });

  it('rejects a PDF over its size limit with 413', async () => {
    const big = Buffer.concat([Buffer.from('%PDF-1.4\n'), Buffer.alloc(PDF_MAX_BYTES, 32), Buffer.from('\n%%EOF\n')]);
    const res = await upload('report', [{ data: big, name: 'report.pdf' }]);
    expect(res.status).toBe(413);
    expect(res.body.error.message).toMatch(/10 MB/);
  });

  it('decides the type by content: a text file renamed .jpg is refused', async () => {
    const before = await photoCount();
    const res = await upload('photos', [{ data: Buffer.from('these are not the pixels you are looking for\n'.repeat(20)), name: 'bales.jpg' }]);
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: 'not_an_image' });
    expect(res.body.error.message).toContain('bales.jpg');
    expect(await photoCount()).toBe(before);
  });

  it('refuses a "PDF" that is not one, and a PDF that is cut short', async () => {
    const fake = await upload('report', [{ data: Buffer.from('Lab results: CP 21, ADF 29\n'), name: 'report.pdf' }]);
    expect(fake.status).toBe(400);
    expect(fake.body.error.code).toBe('not_a_pdf');
    const jpegAsPdf = await upload('report', [{ data: await makeJpeg(200, 100), name: 'scan.pdf' }]);
    expect(jpegAsPdf.body.error.code).toBe('not_a_pdf');
    const full = await makePdf();
    const truncated = await upload('report', [{ data: full.subarray(0, full.length - 40), name: 'report.pdf' }]);
    expect(truncated.status).toBe(400);
  });

  it('refuses an HTML/JS polyglot wrapped in %PDF- … %%EOF, and accepts a real PDF written by pdf-lib', async () => {
    // A polyglot: the PDF magic and end marker around an HTML page (OWASP "file upload": check content, not markers).
    const polyglot = Buffer.from('%PDF-1.7\n<html><body><script>fetch("/api/auth/me").then(r=>r.text()).then(alert)</script></body></html>\n%%EOF\n');
    const rows = await growerFileCount();
    const res = await upload('report', [{ data: polyglot, name: 'report.pdf' }]);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('not_a_pdf');
    // The same markers around one bare object: still no catalog or page tree.
    const halfPdf = Buffer.from('%PDF-1.4\n1 0 obj\n<< /Type /Catalog >>\nendobj\n<script>alert(document.cookie)</script>\n%%EOF');
    expect((await upload('report', [{ data: halfPdf, name: 'report.pdf' }])).status).toBe(400);
    expect(await growerFileCount()).toBe(rows);
    const doc = await PDFDocument.create();
    doc.addPage().drawText('Invented lab: crude protein 12.0 % DM');
    const real = Buffer.from(await doc.save());
    const ok = await upload('report', [{ data: real, name: 'pdf-lib.pdf' }]);
    expect(ok.status).toBe(201);
    const served = await grower.agent.raw.get(`/uploads/lots/${lotId}/report`).buffer(true);
    expect(served.headers['content-type']).toBe('application/pdf');
    expect(served.headers['x-content-type-options']).toBe('nosniff');
    expect(served.headers['content-disposition']).toMatch(/^inline; filename="lab-report-lot-\d+\.pdf"$/);
    expect(Buffer.from(served.body).equals(real)).toBe(true);
  });

  it('refuses an image over the pixel limit before decoding it (decompression bomb)', async () => {
    // 8,000 × 7,000 = 56 megapixels of one colour: a small PNG that would need ~170 MB to decode.
    const bomb = await sharp({ create: { width: 8000, height: 7000, channels: 3, background: '#7a6' } }).png({ compressionLevel: 9 }).toBuffer();
    expect(bomb.length).toBeLessThan(PHOTO_MAX_BYTES);
    // Every way sharp turns compressed bytes into pixels goes through one of these (metadata() reads the header only).
    const decodes = (['toBuffer', 'toFile', 'stats'] as const).map((m) => jest.spyOn(sharp.prototype, m));
    const decodeCalls = () => decodes.reduce((n, spy) => n + spy.mock.calls.length, 0);
    try {
      const res = await upload('photos', [{ data: bomb, name: 'bomb.png' }]);
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('image_too_many_pixels');
      expect(res.body.error.message).toMatch(/56 megapixels\); the limit is 50 megapixels/);
      expect(decodeCalls()).toBe(0);
      // Control: the spies do see the decoding of an ordinary photo.
      expect((await upload('photos', [{ data: await makeJpeg(400, 300), name: 'ordinary.jpg' }])).status).toBe(201);
      expect(decodeCalls()).toBeGreaterThan(0);
    } finally {
      for (const spy of decodes) spy.mockRestore();
    }
  }, 30_000);

  it('rejects the whole request when one of several photos is bad, storing none of them', async () => {
    const written: string[] = [];
    const spying: FileStorage = { ...t.deps.storage, put: async (key, data) => void (written.push(key), await t.deps.storage.put(key, data)) };
    const agent = csrfAgent(createApi({ ...t.deps, storage: spying }));
    await agent.post('/auth/sign-in', { email: grower.email, password: grower.password });
    const before = { photos: await photoCount(), files: await growerFileCount(), folder: await filesIn(t.uploadDir) };
    const res = await upload(
      'photos',
      [
        { data: await makeJpeg(400, 300), name: 'good.jpg' },
        { data: Buffer.from('GIF89a not really'), name: 'bad.jpg' },
      ],
      agent,
    );
    expect(res.status).toBe(400);
    expect(await photoCount()).toBe(before.photos);
    expect(await growerFileCount()).toBe(before.files);
    expect(await filesIn(t.uploadDir)).toEqual(before.folder);
    for (const key of written) expect(await t.deps.db.select().from(storedFiles).where(eq(storedFiles.storageKey, key))).toHaveLength(0);
  });

  it('leaves no orphan row or file when storage fails half-way through an upload', async () => {
    const written: string[] = [];
    const attempted: string[] = [];
    const removed: string[] = [];
    let puts = 0;
    const flaky: FileStorage = {
      async put(key, data) {
        puts += 1;
        attempted.push(key);
        // The original and the first variant are written; the second variant fails (disk full, say).
        if (puts === 3) throw new Error('simulated storage failure');
        written.push(key);
        await t.deps.storage.put(key, data);
      },
      read: (key) => t.deps.storage.read(key),
      async remove(key) {
        removed.push(key);
        await t.deps.storage.remove(key);
      },
    };
    const agent = csrfAgent(createApi({ ...t.deps, storage: flaky }));
    await agent.post('/auth/sign-in', { email: grower.email, password: grower.password });
    const photosBefore = await photoCount();

    const res = await upload('photos', [{ data: await makeJpeg(1700, 1000), name: 'doomed.jpg' }], agent);
    expect(res.status).toBe(500);
    expect(res.body.error.code).toBe('internal');
    expect(await photoCount()).toBe(photosBefore);
    // Only the keys this upload wrote: other test files add stored files in parallel.
    expect(attempted).toHaveLength(3);
    expect(await t.deps.db.select().from(storedFiles).where(inArray(storedFiles.storageKey, attempted))).toHaveLength(0);
    expect(written.length).toBe(2);
    for (const key of written) {
      expect(removed).toContain(key);
      expect(await t.deps.storage.read(key)).toBeNull();
    }
  }, 20_000);

  it('leaves no file behind when the database refuses the rows', async () => {
    const keys: string[] = [];
    const spying: FileStorage = {
      ...t.deps.storage,
      put: async (key, data) => {
        keys.push(key);
        await t.deps.storage.put(key, data);
      },
    };
    const agent = csrfAgent(createApi({ ...t.deps, storage: spying }));
    await agent.post('/auth/sign-in', { email: grower.email, password: grower.password });
    // A fresh draft has no analysis yet, so linking the report fails inside the transaction.
    const draft = await agent.post('/selling/lots', LOT_STEP);
    await agent.put(`/selling/lots/${draft.body.id}/quantity`, QUANTITY_STEP);
    const res = await upload('report', [{ data: await makePdf(), name: 'early.pdf' }], agent, draft.body.id);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('analysis_required');
    expect(keys).toHaveLength(1);
    expect(await t.deps.storage.read(keys[0]!)).toBeNull();
    expect(await t.deps.db.select().from(storedFiles).where(eq(storedFiles.storageKey, keys[0]!))).toHaveLength(0);
  }, 20_000);

  it('serves the lab report only to its grower and admins until the lot is approved, then to signed-in users', async () => {
    const owner = await signedInGrower(t);
    const id = await completeLot(owner.agent);
    const admin = await signedInUser(t, 'admin');
    const buyer = await signedInUser(t, 'buyer');
    const stranger = await signedInGrower(t);
    expect((await owner.agent.get(`/uploads/lots/${id}/report`)).headers['content-type']).toBe('application/pdf');
    expect((await admin.agent.get(`/uploads/lots/${id}/report`)).status).toBe(200);
    expect((await buyer.agent.get(`/uploads/lots/${id}/report`)).status).toBe(404);
    expect((await stranger.agent.get(`/uploads/lots/${id}/report`)).status).toBe(404);
    expect((await t.agent().get(`/uploads/lots/${id}/report`)).status).toBe(401);

    await owner.agent.post(`/selling/lots/${id}/submit`);
    expect((await approveLot(admin.agent, id)).status).toBe(200);
    const pdf = await buyer.agent.raw.get(`/uploads/lots/${id}/report`).buffer(true);
    expect(pdf.status).toBe(200);
    expect(Buffer.from(pdf.body).subarray(0, 5).toString()).toBe('%PDF-');
    expect((await t.agent().get(`/uploads/lots/${id}/report`)).status).toBe(401);
  }, 30_000);

  it('refuses uploads to another grower’s lot and from buyers', async () => {
    const other = await signedInGrower(t);
    const res = await upload('photos', [{ data: await makeJpeg(300, 200), name: 'x.jpg' }], other.agent);
    expect(res.status).toBe(403);
    const buyer = await signedInUser(t, 'buyer');
    expect((await upload('photos', [{ data: await makeJpeg(300, 200), name: 'x.jpg' }], buyer.agent)).status).toBe(403);
  }, 20_000);

  it('tells the uploader what is missing when no file is sent or the field is wrong', async () => {
    const token = await grower.agent.token();
    const none = await grower.agent.raw.post(`/uploads/lots/${lotId}/photos`).set('X-XSRF-TOKEN', token).field('note', 'no file');
    expect(none.status).toBe(400);
    expect(none.body.error.code).toBe('no_file');
    const wrongField = await grower.agent.raw.post(`/uploads/lots/${lotId}/photos`).set('X-XSRF-TOKEN', token).attach('file', await makeJpeg(300, 200), 'x.jpg');
    expect(wrongField.status).toBe(400);
    expect(wrongField.body.error.code).toBe('unexpected_file_field');
  });
});

async function streamToBuffer(stream: NodeJS.ReadableStream): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(Buffer.from(chunk as Buffer));
  return Buffer.concat(chunks);
}

/** Every file under a folder, as sorted relative paths. */
async function filesIn(dir: string): Promise<string[]> {
  const entries = await readdir(dir, { recursive: true, withFileTypes: true });
  return entries.filter((e) => e.isFile()).map((e) => `${e.parentPath}/${e.name}`.slice(dir.length + 1)).sort();
}
