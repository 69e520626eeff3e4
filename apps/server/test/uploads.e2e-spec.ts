import { existsSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import type { AttachmentView } from '@jarday/contracts';
import PDFDocument from 'pdfkit';
import sharp from 'sharp';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Db } from '../src/db/database.js';
import { DB } from '../src/db/database.module.js';
import { dayWithLoad } from './support/day-fixture.js';
import { kitchenWithCrew, type Person, startTestApp, type TestApp } from './support/test-app.js';

type Crew = Awaited<ReturnType<typeof kitchenWithCrew>>;
const MAX_BYTES = 200_000;

/** A photo-like image: a gradient, so the encoders have something real to compress. */
async function image(format: 'png' | 'jpeg' | 'webp', width = 800, height = 600): Promise<Buffer> {
  const raw = Buffer.alloc(width * height * 3);
  for (let y = 0; y < height; y++)
    for (let x = 0; x < width; x++) raw.set([x % 256, y % 256, 120], (y * width + x) * 3);
  return sharp(raw, { raw: { width, height, channels: 3 } })
    .toFormat(format)
    .toBuffer();
}

/** Random pixels do not compress: a PNG well over the test's upload limit. */
const noise = (side: number) =>
  sharp(Buffer.from(Array.from({ length: side * side * 3 }, () => Math.floor(Math.random() * 256))), {
    raw: { width: side, height: side, channels: 3 },
  })
    .png()
    .toBuffer();

const pdf = () =>
  new Promise<Buffer>((resolve) => {
    const doc = new PDFDocument();
    const chunks: Buffer[] = [];
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.text('Scanned recipe card');
    doc.end();
  });

/** Every file under a folder, however deep. */
function filesUnder(dir: string): string[] {
  if (!existsSync(dir)) return [];
  return readdirSync(dir, { recursive: true, withFileTypes: true })
    .filter((e) => e.isFile())
    .map((e) => join(e.parentPath, e.name));
}

describe('attachments: photos and scanned documents (e2e)', () => {
  let t: TestApp;
  let crew: Crew;
  let k: string;
  let dayId: string;
  let loadId: string;
  let recipeId: string;
  let storageDir: string;
  const rows = () =>
    (t.app.get<Db>(DB).$client.prepare('select count(*) as n from attachments').get() as { n: number }).n;

  const upload = (who: Person, bytes: Buffer, name: string, subject = 'day', subjectId?: string, kitchen = k) =>
    request(t.http)
      .post(`/api/kitchens/${kitchen}/attachments`)
      .set(who.auth)
      .field('subject', subject)
      .field('subjectId', subjectId ?? dayId)
      .attach('file', bytes, { filename: name, contentType: 'image/jpeg' });

  beforeAll(async () => {
    t = await startTestApp({ SIGNIN_THROTTLE_LIMIT: '1000', UPLOAD_MAX_BYTES: String(MAX_BYTES) });
    storageDir = join(t.dir, 'uploads');
    crew = await kitchenWithCrew(t.http);
    k = crew.kitchen.id;
    const { day, load } = await dayWithLoad(t.http, k, crew.lead);
    dayId = day.id;
    loadId = load.id;
    const recipes = (await request(t.http).get(`/api/kitchens/${k}/recipes`).set(crew.lead.auth).expect(200)).body as {
      id: string;
    }[];
    recipeId = recipes[0]!.id;
  });
  afterAll(() => t.close());

  it('keeps a PNG photo of a day with a 320 px WebP thumbnail, and serves both with the sniffed type', async () => {
    const png = await image('png', 400, 300);
    const res = await upload(crew.helper, png, 'jars on the counter.png').expect(201);
    const view = res.body as AttachmentView;
    expect(view).toMatchObject({
      subject: 'day',
      subjectId: dayId,
      fileName: 'jars on the counter.png',
      mime: 'image/png',
      bytes: png.length,
      width: 400,
      height: 300,
      hasThumb: true,
      uploadedByName: 'Helper',
    });

    const file = await request(t.http)
      .get(`/api/kitchens/${k}/attachments/${view.id}/file`)
      .set(crew.watcher.auth)
      .buffer(true)
      .expect(200);
    expect(file.headers['content-type']).toBe('image/png');
    expect(file.headers['x-content-type-options']).toBe('nosniff');
    expect(file.headers['content-disposition']).toBe(
      `inline; filename="jars on the counter.png"; filename*=UTF-8''jars%20on%20the%20counter.png`,
    );
    expect(Buffer.compare(file.body as Buffer, png)).toBe(0);

    const thumb = await request(t.http)
      .get(`/api/kitchens/${k}/attachments/${view.id}/thumb`)
      .set(crew.lead.auth)
      .buffer(true)
      .expect(200);
    expect(thumb.headers['content-type']).toBe('image/webp');
    const meta = await sharp(thumb.body as Buffer).metadata();
    expect([meta.format, meta.width, meta.height]).toEqual(['webp', 320, 240]);

    const list = await request(t.http)
      .get(`/api/kitchens/${k}/attachments`)
      .query({ subject: 'day', subjectId: dayId })
      .set(crew.watcher.auth)
      .expect(200);
    expect((list.body as AttachmentView[]).map((a) => a.id)).toEqual([view.id]);
  });

  it('takes a JPEG of a load and a WebP of a recipe, and a PDF without a thumbnail', async () => {
    const jpeg = await upload(crew.lead, await image('jpeg', 300, 500), 'load.jpeg', 'load', loadId).expect(201);
    expect(jpeg.body).toMatchObject({ mime: 'image/jpeg', width: 300, height: 500, hasThumb: true });
    const webp = await upload(crew.lead, await image('webp', 100, 80), 'card.webp', 'recipe', recipeId).expect(201);
    // A small photo is not enlarged for its thumbnail.
    const thumb = await request(t.http)
      .get(`/api/kitchens/${k}/attachments/${(webp.body as AttachmentView).id}/thumb`)
      .set(crew.lead.auth)
      .buffer(true)
      .expect(200);
    expect((await sharp(thumb.body as Buffer).metadata()).width).toBe(100);

    // A PDF named .jpg is still a PDF: the content decides, and the name takes the real extension.
    const card = await upload(crew.helper, await pdf(), 'recipe card.jpg', 'recipe', recipeId).expect(201);
    const view = card.body as AttachmentView;
    expect(view).toMatchObject({ mime: 'application/pdf', fileName: 'recipe card.pdf', hasThumb: false, width: null });
    const file = await request(t.http)
      .get(`/api/kitchens/${k}/attachments/${view.id}/file`)
      .set(crew.helper.auth)
      .buffer(true)
      .expect(200);
    expect(file.headers['content-type']).toBe('application/pdf');
    expect(file.headers['content-disposition']).toMatch(/^attachment; filename="recipe card.pdf"/);
    await request(t.http).get(`/api/kitchens/${k}/attachments/${view.id}/thumb`).set(crew.helper.auth).expect(404);
  });

  it('refuses an HTML page or a program named photo.jpg, and keeps nothing of it', async () => {
    const beforeRows = rows();
    const beforeFiles = filesUnder(storageDir).length;
    const html = Buffer.from('<!doctype html><html><body><script>alert(1)</script></body></html>');
    const refusedHtml = await upload(crew.helper, html, 'photo.jpg').expect(415);
    expect(refusedHtml.body).toMatchObject({ code: 'unsupported_file_type' });
    expect((refusedHtml.body as { message: string }).message).toMatch(/not a photo or a PDF/);

    // A Windows program starts "MZ" and carries a PE header at the offset stored at 0x3c.
    const exe = Buffer.alloc(512);
    exe.write('MZ', 0, 'latin1');
    exe.writeUInt32LE(0x80, 0x3c);
    exe.write('PE\0\0', 0x80, 'latin1');
    const refusedExe = await upload(crew.helper, exe, 'photo.jpg').expect(415);
    expect((refusedExe.body as { message: string }).message).toMatch(/really EXE/);

    // A PNG signature with nothing decodable behind it passes the sniff but not the decoder.
    const broken = (await image('png')).subarray(0, 100);
    const refusedBroken = await upload(crew.helper, broken, 'broken.png').expect(422);
    expect(refusedBroken.body).toMatchObject({ code: 'unreadable_image' });

    expect(rows()).toBe(beforeRows);
    expect(filesUnder(storageDir)).toHaveLength(beforeFiles);
  });

  it('refuses a file over UPLOAD_MAX_BYTES with the limit in words, and keeps nothing of it', async () => {
    const beforeRows = rows();
    const beforeFiles = filesUnder(storageDir).length;
    const big = await noise(300);
    expect(big.length).toBeGreaterThan(MAX_BYTES);
    const res = await upload(crew.helper, big, 'big.png').expect(413);
    expect(res.body).toMatchObject({ code: 'file_too_large' });
    expect((res.body as { message: string }).message).toMatch(/the limit is 195 KB/);
    expect(rows()).toBe(beforeRows);
    expect(filesUnder(storageDir)).toHaveLength(beforeFiles);
  });

  it('checks the subject and the form: a subject of another kitchen is not found, a missing file is a 400', async () => {
    const png = await image('png', 40, 40);
    // The outsider attaches to their own kitchen, naming this kitchen's day: not found there.
    await upload(crew.outsider, png, 'x.png', 'day', dayId, crew.otherKitchen.id).expect(404);
    await upload(crew.outsider, png, 'x.png', 'day', dayId).expect(404);
    await upload(crew.helper, png, 'x.png', 'lot', '00000000-0000-4000-8000-000000000000').expect(404);
    const badSubject = await upload(crew.helper, png, 'x.png', 'jar').expect(400);
    expect((badSubject.body as { issues: { path: string }[] }).issues.map((i) => i.path)).toEqual(['subject']);
    const noFile = await request(t.http)
      .post(`/api/kitchens/${k}/attachments`)
      .set(crew.helper.auth)
      .field('subject', 'day')
      .field('subjectId', dayId)
      .expect(400);
    expect((noFile.body as { issues: { path: string }[] }).issues.map((i) => i.path)).toEqual(['file']);
    const wrongField = await request(t.http)
      .post(`/api/kitchens/${k}/attachments`)
      .set(crew.helper.auth)
      .field('subject', 'day')
      .field('subjectId', dayId)
      .attach('photo', png, 'x.png')
      .expect(400);
    expect((wrongField.body as { message: string }).message).toMatch(/form field "file"/);
  });

  it('lets a watcher look but not add, and keeps another kitchen out (404)', async () => {
    const png = await image('png', 64, 48);
    await upload(crew.watcher, png, 'watcher.png').expect(403);
    const view = (await upload(crew.helper, png, 'mine.png').expect(201)).body as AttachmentView;
    for (const path of ['file', 'thumb']) {
      await request(t.http)
        .get(`/api/kitchens/${k}/attachments/${view.id}/${path}`)
        .set(crew.outsider.auth)
        .expect(404);
      // Through the outsider's own kitchen the id names nothing either.
      await request(t.http)
        .get(`/api/kitchens/${crew.otherKitchen.id}/attachments/${view.id}/${path}`)
        .set(crew.outsider.auth)
        .expect(404);
      await request(t.http).get(`/api/kitchens/${k}/attachments/${view.id}/${path}`).expect(401);
    }
    await request(t.http)
      .get(`/api/kitchens/${crew.otherKitchen.id}/attachments`)
      .query({ subject: 'day', subjectId: dayId })
      .set(crew.outsider.auth)
      .expect(200, []);
    await request(t.http)
      .delete(`/api/kitchens/${crew.otherKitchen.id}/attachments/${view.id}`)
      .set(crew.outsider.auth)
      .expect(404);
  });

  it('treats a path-looking name as a name: stored under its own key, sent back without folders', async () => {
    const png = await image('png', 32, 32);
    const names = ['../../../../etc/passwd.png', '..\\..\\windows\\evil".png', '/abs/odd;<name>|*.png'];
    for (const name of names) {
      const view = (await upload(crew.helper, png, name).expect(201)).body as AttachmentView;
      expect(view.fileName).not.toMatch(/[/\\";<>|*]|\.\./);
      const file = await request(t.http)
        .get(`/api/kitchens/${k}/attachments/${view.id}/file`)
        .set(crew.helper.auth)
        .expect(200);
      expect(file.headers['content-disposition']).toMatch(/^inline; filename="[^"/\\]+\.png"; filename\*=UTF-8''/);
    }
    expect(existsSync(join(t.dir, 'etc'))).toBe(false);
    expect(existsSync(join(t.dir, '..', 'etc', 'passwd.png'))).toBe(false);
    // Every stored file sits in the kitchen's folder under a key made of the attachment's id.
    for (const file of filesUnder(storageDir)) {
      expect(file.slice(storageDir.length)).toMatch(/^\/[0-9a-f-]{36}\/[0-9a-f-]{36}(\.thumb\.webp)?$/);
    }
  });

  it('lets a lead remove anything and a helper only their own; the bytes go with the row', async () => {
    const png = await image('png', 50, 50);
    const leads = (await upload(crew.lead, png, 'lead.png').expect(201)).body as AttachmentView;
    const helpers = (await upload(crew.helper, png, 'helper.png').expect(201)).body as AttachmentView;
    await request(t.http).delete(`/api/kitchens/${k}/attachments/${leads.id}`).set(crew.helper.auth).expect(403);
    await request(t.http).delete(`/api/kitchens/${k}/attachments/${helpers.id}`).set(crew.watcher.auth).expect(403);
    const before = filesUnder(storageDir).length;
    await request(t.http).delete(`/api/kitchens/${k}/attachments/${helpers.id}`).set(crew.helper.auth).expect(204);
    await request(t.http).delete(`/api/kitchens/${k}/attachments/${leads.id}`).set(crew.lead.auth).expect(204);
    expect(filesUnder(storageDir)).toHaveLength(before - 4);
    await request(t.http).get(`/api/kitchens/${k}/attachments/${leads.id}/file`).set(crew.lead.auth).expect(404);
    await request(t.http).delete(`/api/kitchens/${k}/attachments/${leads.id}`).set(crew.lead.auth).expect(404);
  });
});
