import { beforeEach, describe, expect, it } from 'vitest';
import sharp from 'sharp';
import exifReader from 'exif-reader';
import { AuditEntry, MenuItem } from '../src/db/models/index.js';
import { countPhotoRows } from '../src/db/queries/menu-photos.js';
import { useStack } from './support.js';
import { signedInAgent, type Agent } from './owner-helpers.js';

const stack = useStack();
let owner: Agent;
let itemId: string;
beforeEach(async () => {
  owner = await signedInAgent(stack, 'owner@fryline.test');
  itemId = (await MenuItem.findOne({ where: { name: 'Cardamom Sugar' } }))!.id;
});

/**
 * A camera-like JPEG: 2000 × 1500 pixels stored sideways, with EXIF
 * orientation 6 (turn 90° clockwise to view, EXIF 2.32 §4.6.4), a camera
 * make, and a GPS position (EXIF GPS IFD, made up for the test).
 */
async function cameraPhoto(): Promise<Buffer> {
  const { data, info } = await sharp({ create: { width: 2000, height: 1500, channels: 3, background: { r: 214, g: 160, b: 92 } } })
    .raw()
    .toBuffer({ resolveWithObject: true });
  // some texture, so the JPEG is photo-sized rather than a flat colour
  for (let i = 0; i < data.length; i += 7) data[i] = (i * 31) % 256;
  return sharp(data, { raw: info })
    .jpeg({ quality: 92 })
    .withExif({
      IFD0: { Make: 'Fieldcam', Model: 'Market 1' },
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '39/1 44/1 30/1', GPSLongitudeRef: 'W', GPSLongitude: '104/1 59/1 0/1' },
    })
    .withMetadata({ orientation: 6 })
    .toBuffer();
}

async function nothingStored() {
  expect(await countPhotoRows()).toEqual({ photos: 0, files: 0 });
  expect((await MenuItem.findByPk(itemId))!.photoId).toBeNull();
  expect(await AuditEntry.count({ where: { action: 'menu.photo' } })).toBe(0);
}

describe('menu photo upload', () => {
  it('accepts a real photo: upright, resized to 320/640/1280 WebP, served with year-long caching, EXIF and GPS gone', async () => {
    const jpeg = await cameraPhoto();
    // the upload really carries the location and the orientation (read back with exif-reader)
    const sent = exifReader((await sharp(jpeg).metadata()).exif!);
    expect(sent.GPSInfo?.GPSLatitude).toEqual([39, 44, 30]);
    expect(sent.Image?.Orientation).toBe(6);

    const res = await owner.post(`/api/staff/menu-items/${itemId}/photo`).attach('photo', jpeg, { filename: 'stall.jpg', contentType: 'image/jpeg' });
    expect(res.status).toBe(201);
    // turned upright: 1500 wide, 2000 high, so each size is 4:3 tall
    expect(res.body.files.map((f: any) => [f.width, f.height])).toEqual([[320, 427], [640, 853], [1280, 1707]]);
    expect(res.body).toMatchObject({ width: 1280, height: 1707 });
    expect(res.body.urls).toHaveLength(3);
    expect(res.body.srcset).toBe(res.body.files.map((f: any) => `${f.url} ${f.width}w`).join(', '));

    for (const file of res.body.files) {
      const got = await fetch(`${stack.url}${file.url}`);
      expect(got.status).toBe(200);
      expect(got.headers.get('content-type')).toBe('image/webp');
      expect(got.headers.get('cache-control')).toBe('public, max-age=31536000, immutable');
      const bytes = Buffer.from(await got.arrayBuffer());
      const meta = await sharp(bytes).metadata();
      expect(meta).toMatchObject({ format: 'webp', width: file.width, height: file.height });
      expect(meta.exif).toBeUndefined();
      expect(meta.orientation).toBeUndefined();
      // nor anywhere in the file: the camera make and the EXIF header are not in the bytes
      expect(bytes.includes(Buffer.from('Fieldcam'))).toBe(false);
      expect(bytes.includes(Buffer.from('Exif\0\0'))).toBe(false);
      // the URL names the content: the same file again is "not modified"
      const again = await fetch(`${stack.url}${file.url}`, { headers: { 'if-none-match': got.headers.get('etag')! } });
      expect(again.status).toBe(304);
    }

    // the shop's bake days show it on the item
    const days = (await (await fetch(`${stack.url}/api/bake-days`)).json()) as any[];
    const shown = days[0].menu.find((m: any) => m.id === itemId);
    expect(shown.photo).toMatchObject({ id: res.body.id, width: 1280, height: 1707, srcset: res.body.srcset });
    expect(await AuditEntry.count({ where: { action: 'menu.photo', subjectId: itemId } })).toBe(1);
  });

  it('accepts PNG and WebP by content, keeps a small photo at its own width, and replaces the old photo', async () => {
    const png = await sharp({ create: { width: 300, height: 200, channels: 4, background: '#a0522d' } }).png().toBuffer();
    const first = await owner.post(`/api/staff/menu-items/${itemId}/photo`).attach('photo', png, { filename: 'no-extension', contentType: 'application/octet-stream' });
    expect(first.status).toBe(201);
    expect(first.body.files.map((f: any) => f.width)).toEqual([300]);
    const webp = await sharp({ create: { width: 800, height: 800, channels: 3, background: '#deb887' } }).webp().toBuffer();
    const second = await owner.post(`/api/staff/menu-items/${itemId}/photo`).attach('photo', webp, 'square.webp');
    expect(second.status).toBe(201);
    expect(second.body.files.map((f: any) => f.width)).toEqual([320, 640, 800]);
    expect(await countPhotoRows()).toEqual({ photos: 1, files: 3 });
    expect((await fetch(`${stack.url}${first.body.urls[0]}`)).status).toBe(404);
  });

  it('refuses a text file named .jpg with 415 and a clear message, storing nothing', async () => {
    const text = Buffer.from('These are my notes about doughnuts, not a photo.\n'.repeat(40));
    const res = await owner.post(`/api/staff/menu-items/${itemId}/photo`).attach('photo', text, { filename: 'doughnut.jpg', contentType: 'image/jpeg' });
    expect(res.status).toBe(415);
    expect(res.body.error).toMatchObject({ code: 'unsupported_type' });
    expect(res.body.error.message).toMatch(/not a JPEG, PNG or WebP/);
    await nothingStored();
  });

  it('refuses a file that starts like a JPEG but is not one with 415', async () => {
    const fake = Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), Buffer.alloc(5000, 7)]);
    const res = await owner.post(`/api/staff/menu-items/${itemId}/photo`).attach('photo', fake, 'broken.jpg');
    expect(res.status).toBe(415);
    await nothingStored();
  });

  it('refuses a 20 MB file with 413 and says the limit, storing nothing', async () => {
    const big = Buffer.concat([await cameraPhoto(), Buffer.alloc(20 * 1024 * 1024, 1)]);
    const res = await owner.post(`/api/staff/menu-items/${itemId}/photo`).attach('photo', big, 'huge.jpg');
    expect(res.status).toBe(413);
    expect(res.body.error).toMatchObject({ code: 'too_large' });
    expect(res.body.error.message).toMatch(/8 MB/);
    await nothingStored();
  });

  it('refuses a photo in the wrong field with 400, storing nothing', async () => {
    const res = await owner.post(`/api/staff/menu-items/${itemId}/photo`).attach('picture', await cameraPhoto(), 'stall.jpg');
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: 'wrong_field' });
    expect(res.body.error.message).toMatch(/"photo"/);
    await nothingStored();
  });

  it('refuses a request with no file at all with 400', async () => {
    const res = await owner.post(`/api/staff/menu-items/${itemId}/photo`).field('note', 'forgot the file');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('no_photo');
    await nothingStored();
  });

  it('lets only the owner upload', async () => {
    for (const email of ['baker@fryline.test', 'counter@fryline.test', 'customer@fryline.test']) {
      const someone = await signedInAgent(stack, email);
      const res = await someone.post(`/api/staff/menu-items/${itemId}/photo`).attach('photo', await cameraPhoto(), 'stall.jpg');
      expect(res.status).toBe(403);
    }
    await nothingStored();
  });
});
