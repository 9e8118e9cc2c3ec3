import { crc32, deflateSync } from 'node:zlib';
import request from 'supertest';
import sharp from 'sharp';
import exifr from 'exifr';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addDays, todayIn, type AnimalResponse, type MoltResponse, type PhotoRef } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { createAnimal, speciesId } from './support/fixtures/collection';

let t: TestApp;
let mira: SignedIn;
let other: SignedIn;
let animal: AnimalResponse;
const http = () => request(t.app.getHttpServer());

/** Reads a response body as bytes (supertest leaves binary bodies unparsed otherwise). */
function binary(res: request.Response, cb: (err: Error | null, body: Buffer) => void): void {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
}
const download = async (url: string, who: SignedIn): Promise<Buffer> =>
  (await http().get(url).set('Authorization', who.bearer).buffer(true).parse(binary).expect(200)).body as Buffer;

const upload = (url: string, who: SignedIn, bytes: Buffer, filename: string) =>
  http()
    .post(url)
    .set('Authorization', who.bearer)
    .attach('file', bytes, { filename, contentType: filename.endsWith('.png') ? 'image/png' : 'image/jpeg' });

/** PNG chunk (ISO/IEC 15948 §5.3): length, type, data, CRC-32 over type and data. */
function chunk(type: string, data: Buffer): Buffer {
  const len = Buffer.alloc(4);
  len.writeUInt32BE(data.length);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(Buffer.concat([Buffer.from(type, 'latin1'), data])));
  return Buffer.concat([len, Buffer.from(type, 'latin1'), data, crc]);
}

/** A small file whose PNG header claims `width` × `height` pixels: what a decompression bomb looks like before decoding. */
function pngClaiming(width: number, height: number): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr.set([8, 2, 0, 0, 0], 8); // 8-bit truecolour, no interlace
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', ihdr),
    chunk('IDAT', deflateSync(Buffer.alloc(1 + width * 3))), // one row; the rest is never read
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

/** A JPEG carrying a GPS position (51.5 N, 0.125 W) and a camera make, written by sharp's withExif. */
async function jpegWithGps(): Promise<Buffer> {
  return sharp({ create: { width: 64, height: 48, channels: 3, background: '#6b8e23' } })
    .withExif({
      IFD0: { Make: 'FieldCam', Model: 'Test 1' },
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '51/1 30/1 0/1', GPSLongitudeRef: 'W', GPSLongitude: '0/1 7/1 30/1' },
    })
    .jpeg()
    .toBuffer();
}

beforeAll(async () => {
  t = await createTestApp();
  mira = await registerKeeper(t.app, 'Mira');
  other = await registerKeeper(t.app, 'Other');
  animal = await createAnimal(t.app, mira, { speciesId: await speciesId(t.orm, 'Caribena versicolor'), label: 'CV-PHOTO', sex: 'female' });
});
afterAll(async () => {
  await t.close();
});

describe('photo uploads', () => {
  it('a PNG is accepted, re-encoded, and listed on the animal with a thumbnail', async () => {
    const png = await sharp({ create: { width: 800, height: 600, channels: 4, background: { r: 47, g: 93, b: 80, alpha: 1 } } })
      .png()
      .toBuffer();
    expect((await sharp(png).metadata()).format).toBe('png');
    const res = await upload(`/api/animals/${animal.id}/photos`, mira, png, 'cv.png').expect(201);
    const ref = res.body as PhotoRef;
    expect(ref).toMatchObject({ url: `/api/photos/${ref.id}`, thumbUrl: `/api/photos/${ref.id}/thumb`, width: 800, height: 600 });

    const full = await download(ref.url, mira);
    expect((await sharp(full).metadata()).format).toBe('jpeg');
    const thumb = await sharp(await download(ref.thumbUrl, mira)).metadata();
    expect(Math.max(thumb.width!, thumb.height!)).toBe(320);

    const detail = await http().get(`/api/animals/${animal.id}`).set('Authorization', mira.bearer).expect(200);
    expect(detail.body.photos.map((p: PhotoRef) => p.id)).toEqual([ref.id]);
  });

  it('a JPEG with GPS metadata is accepted and the stored image has none (checked with exifr)', async () => {
    const input = await jpegWithGps();
    // exifr must really see the position in the input, or the check below proves nothing.
    const gpsIn = await exifr.gps(input);
    expect(gpsIn.latitude).toBeCloseTo(51.5, 3);
    expect(gpsIn.longitude).toBeCloseTo(-0.125, 3);

    const res = await upload(`/api/animals/${animal.id}/photos`, mira, input, 'field.jpg').expect(201);
    for (const url of [res.body.url, res.body.thumbUrl]) {
      const stored = await download(url, mira);
      expect(await exifr.gps(stored)).toBeUndefined();
      expect(await exifr.parse(stored, true)).toBeUndefined();
    }
  });

  it('turns a photo upright from its EXIF orientation before the metadata goes', async () => {
    // 60×20 pixels stored sideways with orientation 6 (rotate 90° clockwise to view)
    const sideways = await sharp({ create: { width: 60, height: 20, channels: 3, background: '#d98e04' } })
      .withMetadata({ orientation: 6 })
      .jpeg()
      .toBuffer();
    const res = await upload(`/api/animals/${animal.id}/photos`, mira, sideways, 'side.jpg').expect(201);
    expect(res.body).toMatchObject({ width: 20, height: 60 });
    const stored = await sharp(await download(res.body.url, mira)).metadata();
    expect([stored.width, stored.height, stored.orientation]).toEqual([20, 60, undefined]);
  });

  it('a text file renamed .png is refused with 415 and a clear message', async () => {
    const res = await upload(`/api/animals/${animal.id}/photos`, mira, Buffer.from('label,species\nMO-1,Tliltocatl vagans\n'), 'not-really.png').expect(415);
    expect(res.body.message).toMatch(/not a photo we can read/);
  });

  it('a file over 15 MB is refused with 413 and a clear message', async () => {
    const res = await upload(`/api/animals/${animal.id}/photos`, mira, Buffer.alloc(15 * 1024 * 1024 + 1, 0xff), 'huge.jpg').expect(413);
    expect(res.body.message).toBe('The photo is larger than 15 MB. Send a smaller one.');
  });

  it('an image over 40 megapixels is refused from its header with 413, and nothing is stored', async () => {
    const bomb = pngClaiming(8000, 5001); // 40.008 megapixels in a file of a few kilobytes
    expect(bomb.length).toBeLessThan(100_000);
    expect(await sharp(bomb).metadata()).toMatchObject({ format: 'png', width: 8000, height: 5001 });
    const before = (await http().get(`/api/animals/${animal.id}`).set('Authorization', mira.bearer).expect(200)).body.photos.length;
    const res = await upload(`/api/animals/${animal.id}/photos`, mira, bomb, 'bomb.png').expect(413);
    expect(res.body.message).toBe('The photo has 40.0 megapixels (8000 × 5001); at most 40 are taken. Send a smaller one.');
    const after = (await http().get(`/api/animals/${animal.id}`).set('Authorization', mira.bearer).expect(200)).body.photos.length;
    expect(after).toBe(before);
  });

  it('no file is a 400 naming the field', async () => {
    const res = await http().post(`/api/animals/${animal.id}/photos`).set('Authorization', mira.bearer).field('note', 'x').expect(400);
    expect(res.body.message).toMatch(/form field "file"/);
  });

  it('another keeper can neither fetch the photo (404) nor upload to the animal (404)', async () => {
    const png = await sharp({ create: { width: 10, height: 10, channels: 3, background: '#b5473a' } })
      .png()
      .toBuffer();
    const ref = (await upload(`/api/animals/${animal.id}/photos`, mira, png, 'a.png').expect(201)).body as PhotoRef;
    const full = await http().get(ref.url).set('Authorization', other.bearer).expect(404);
    expect(full.body.message).toMatch(/not yours to see/);
    await http().get(ref.thumbUrl).set('Authorization', other.bearer).expect(404);
    await http().get(ref.url).expect(401);
    await upload(`/api/animals/${animal.id}/photos`, other, png, 'a.png').expect(404);
  });

  it('a molt photo belongs to the molt and is listed with it', async () => {
    const today = todayIn('UTC', new Date());
    const molt = (
      await http()
        .post(`/api/animals/${animal.id}/molts`)
        .set('Authorization', mira.bearer)
        .send({ moltedOn: addDays(today, -3), exuviaSex: 'female' })
        .expect(201)
    ).body as MoltResponse;
    const png = await sharp({ create: { width: 30, height: 30, channels: 3, background: '#2f5d50' } })
      .png()
      .toBuffer();
    const ref = (await upload(`/api/animals/${animal.id}/molts/${molt.id}/photos`, mira, png, 'exuvia.png').expect(201)).body as PhotoRef;
    const molts = (await http().get(`/api/animals/${animal.id}/molts`).set('Authorization', mira.bearer).expect(200)).body as MoltResponse[];
    expect(molts[0].photos.map((p) => p.id)).toEqual([ref.id]);
    await http().get(ref.url).set('Authorization', other.bearer).expect(404);
    await download(ref.url, mira);
  });
});
