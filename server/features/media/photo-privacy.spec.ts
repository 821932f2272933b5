import { eq } from 'drizzle-orm';
import express from 'express';
import request from 'supertest';
import { photos, storedFiles } from '../../db/schema';
import { startTestApi, type TestApi } from '../../../tests/support/test-api';
import { LOT_STEP, makeJpeg, signedInGrower } from '../../../tests/support/grower-lot';
import { mediaRouter } from './media.router';

/*
 * Photo originals keep the camera's metadata (GPS: where the grower lives). Only the stripped WebP
 * variants are public; the original is private and goes when the photo goes.
 */
describe('photo originals stay private', () => {
  let t: TestApi;
  let grower: Awaited<ReturnType<typeof signedInGrower>>;
  let media: express.Express;
  let lotId: number;

  beforeAll(async () => {
    t = await startTestApi();
    grower = await signedInGrower(t);
    lotId = (await grower.agent.post('/selling/lots', LOT_STEP)).body.id;
    media = express().use('/media', mediaRouter(t.deps.storage));
  });
  afterAll(() => t.close());

  async function uploadPhoto() {
    const token = await grower.agent.token();
    const res = await grower.agent.raw.post(`/uploads/lots/${lotId}/photos`).set('X-XSRF-TOKEN', token).attach('photos', await makeJpeg(900, 600), 'yard.jpg');
    expect(res.status).toBe(201);
    const photo = res.body.photos.at(-1) as { id: number; variants: { url: string }[] };
    const [row] = await t.deps.db.select().from(photos).where(eq(photos.id, photo.id));
    const [original] = await t.deps.db.select().from(storedFiles).where(eq(storedFiles.id, row!.originalFileId!));
    return { photo, originalKey: original!.storageKey };
  }

  it('serves variants but never the original, however the path is escaped', async () => {
    const { photo, originalKey } = await uploadPhoto();
    expect(originalKey).toMatch(/^private\/originals\//);
    const variant = await request(media).get(photo.variants[0]!.url);
    expect(variant.status).toBe(200);
    expect(variant.headers['content-type']).toBe('image/webp');

    // A file where older uploads kept originals, next to the public folder.
    const legacy = 'originals/0b5e1c8e-8d59-4b39-9b8e-2f0c6f3f4a11.jpg';
    await t.deps.storage.put(legacy, await makeJpeg(100, 100));
    const attempts = [
      '/media/photos/..%2Foriginals%2F0b5e1c8e-8d59-4b39-9b8e-2f0c6f3f4a11.jpg',
      '/media/photos/..%2f..%2foriginals%2f0b5e1c8e-8d59-4b39-9b8e-2f0c6f3f4a11.jpg',
      `/media/photos/..%2F${originalKey.replace(/\//g, '%2F')}`,
      `/media/photos/%2E%2E/%2E%2E/${originalKey}`,
      `/media/photos/..%5C${originalKey.replace(/\//g, '%5C')}`,
      `/media/${originalKey}`,
    ];
    for (const path of attempts) {
      const res = await request(media).get(path);
      expect({ path, status: res.status, type: res.headers['content-type'] }).toEqual({ path, status: 404, type: 'text/plain; charset=utf-8' });
    }
  });

  it('answers bad media paths in plain text, without a stack trace or a file path', async () => {
    for (const path of ['/media/photos/%E0%A4%A', '/media/photos/nope.webp', '/media/reports/1/x.pdf']) {
      const res = await request(media).get(path);
      expect(res.status).toBeGreaterThanOrEqual(400);
      expect(res.status).toBeLessThan(500);
      expect(res.headers['content-type']).toBe('text/plain; charset=utf-8');
      expect(res.text).not.toMatch(/\bat \w|node_modules|\/tmp\/|<html|Error/i);
    }
  });

  it('removes the original, file and record, when the grower deletes the photo', async () => {
    const { photo, originalKey } = await uploadPhoto();
    expect(await t.deps.storage.read(originalKey)).not.toBeNull();
    const res = await grower.agent.delete(`/selling/lots/${lotId}/photos/${photo.id}`);
    expect(res.status).toBe(200);
    expect(await t.deps.storage.read(originalKey)).toBeNull();
    expect(await t.deps.db.select().from(storedFiles).where(eq(storedFiles.storageKey, originalKey))).toEqual([]);
    expect((await request(media).get(photo.variants[0]!.url)).status).toBe(404);
  });
});
