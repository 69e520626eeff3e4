import type { JarRecordView, LotView } from '@jarday/contracts';
import jsQRModule from 'jsqr';
import { getDocument, OPS } from 'pdfjs-dist/legacy/build/pdf.mjs';
import request from 'supertest';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { addLoad, canningDay, HOUR, liftLoad } from './support/lifted-load.js';
import { kitchenWithCrew, startTestApp, type TestApp } from './support/test-app.js';

type Crew = Awaited<ReturnType<typeof kitchenWithCrew>>;
// jsqr is CommonJS whose exports are the function itself, with a `default` pointing at it too.
const jsQR = jsQRModule.default;
const PUBLIC_URL = 'https://jars.kitchen.test';
const RECORD_URL = /^https:\/\/jars\.kitchen\.test\/r\/([A-Za-z0-9_-]{16,64})-(\d+)-(\d+)$/;

interface PdfImage {
  width: number;
  height: number;
  kind: number;
  data: Uint8ClampedArray;
}

/** The text of each page, and what each image on it decodes to as a QR code (RGB images are widened to RGBA). */
async function readPdf(bytes: Buffer): Promise<{ pages: string[]; codes: (string | null)[][] }> {
  const doc = await getDocument({ data: new Uint8Array(bytes), useSystemFonts: false }).promise;
  const pages: string[] = [];
  const codes: (string | null)[][] = [];
  for (let p = 1; p <= doc.numPages; p++) {
    const page = await doc.getPage(p);
    const text = await page.getTextContent();
    pages.push(text.items.map((i) => ('str' in i ? i.str : '')).join(' '));
    const ops = await page.getOperatorList();
    const found: (string | null)[] = [];
    for (const [i, fn] of ops.fnArray.entries()) {
      if (fn !== OPS.paintImageXObject) continue;
      const name = (ops.argsArray[i] as [string])[0];
      const img = await new Promise<PdfImage>((resolve) => {
        page.objs.get(name, resolve);
      });
      let rgba = img.data;
      if (img.kind === 2) {
        rgba = new Uint8ClampedArray(img.width * img.height * 4);
        for (let px = 0; px < img.width * img.height; px++) {
          rgba.set([img.data[px * 3]!, img.data[px * 3 + 1]!, img.data[px * 3 + 2]!, 255], px * 4);
        }
      }
      found.push(jsQR(rgba, img.width, img.height)?.data ?? null);
    }
    codes.push(found);
  }
  return { pages, codes };
}

const RECORD_KEYS = [
  'altitude',
  'bestBy',
  'code',
  'dayDate',
  'flagged',
  'jarNumber',
  'jarSize',
  'loadNumber',
  'member',
  'method',
  'processMinutes',
  'product',
  'seal',
];

describe('jar labels and the jar record (e2e: lots made through the seal-check API, Date frozen)', () => {
  let t: TestApp;
  let crew: Crew;
  let lot: LotView;
  let dayId: string;
  let loadIds: string[];
  let loadMinutes: number[];
  const base = () => `/api/kitchens/${crew.kitchen.id}`;
  const labels = (sheet: string) =>
    request(t.http).get(`${base()}/lots/${lot.id}/labels.pdf`).query({ sheet }).set(crew.watcher.auth).buffer(true);

  beforeAll(async () => {
    t = await startTestApp({ SIGNIN_THROTTLE_LIMIT: '1000', PUBLIC_URL: `${PUBLIC_URL}/` }, true);
    crew = await kitchenWithCrew(t.http);
    const lifted = new Date(Date.now() - 3 * 24 * HOUR);
    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(lifted);
    const day = await canningDay(t.http, crew.kitchen.id, crew.lead, { date: '2026-08-15' });
    dayId = day.dayId;
    // Load 1: six jars, jar 6 did not seal. Load 2: twelve jars, all sealed. 17 labels in all.
    const loads = [await addLoad(t.http, crew.kitchen.id, crew.lead, day, 0, 6)];
    loads.push(await addLoad(t.http, crew.kitchen.id, crew.lead, day, 0, 12));
    loadIds = loads.map((l) => l.id);
    loadMinutes = loads.map((l) => l.plan.minutes);
    for (const load of loads) await liftLoad(t, crew.helper, day.dayId, load.id);
    vi.setSystemTime(new Date(lifted.getTime() + 12 * HOUR));
    for (const [n, load] of loads.entries()) {
      await request(t.http).post(`${base()}/loads/${load.id}/bands-off`).set(crew.helper.auth).send({}).expect(200);
      const jars = Array.from({ length: load.jars }, (_, i) =>
        n === 0 && i === 5
          ? { jarNumber: 6, result: 'unsealed', outcome: 'fridge' }
          : { jarNumber: i + 1, result: 'sealed', outcome: 'store' },
      );
      await request(t.http)
        .put(`${base()}/loads/${load.id}/seal-checks`)
        .set(crew.helper.auth)
        .send({ jars })
        .expect(200);
    }
    vi.useRealTimers();
    const lots = (await request(t.http).get(`${base()}/lots`).set(crew.lead.auth).expect(200)).body as LotView[];
    lot = lots[0]!;
  }, 60_000);
  afterEach(() => vi.useRealTimers());
  afterAll(() => t.close());

  it('prints one label per sealed jar on US Letter 2 x 4 in sheets: 10 a page, each with its own QR code', async () => {
    const res = await labels('letter-rect-2x4').expect(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const pdf = await readPdf(res.body as Buffer);
    expect(pdf.pages).toHaveLength(2);
    expect(pdf.codes.map((c) => c.length)).toEqual([10, 7]);
    const all = pdf.pages.join(' ');
    expect(all).toContain(`Lot ${lot.code}`);
    expect(all).toContain('Load 1 · jar 5');
    expect(all).toContain('Load 2 · jar 12');
    expect(all).toContain(lot.recipeName);
    expect(all).toContain('Canned Aug 15, 2026');
    expect(all).toContain('Best by Aug 15, 2027');
    // Jar 6 of load 1 did not seal: it gets no label.
    expect(all).not.toContain('Load 1 · jar 6');

    const decoded = pdf.codes.flat();
    expect(decoded.every((d) => d !== null && RECORD_URL.test(d))).toBe(true);
    const jars = decoded.map((d) => RECORD_URL.exec(d!)!.slice(2).join('-'));
    const expected = [...[1, 2, 3, 4, 5].map((j) => `1-${j}`), ...Array.from({ length: 12 }, (_, j) => `2-${j + 1}`)];
    expect(jars).toEqual(expected);
    expect(new Set(decoded.map((d) => RECORD_URL.exec(d!)![1])).size).toBe(1);
  });

  it('fills a page of 20 round lid labels and one of 21 A4 labels, QR codes that decode to the record', async () => {
    for (const [sheet, perPage] of [
      ['letter-round-2in', 20],
      ['a4-rect-63x38', 21],
    ] as const) {
      const pdf = await readPdf((await labels(sheet).expect(200)).body as Buffer);
      expect(pdf.pages).toHaveLength(1);
      // 17 labels fill less than one page of either sheet.
      expect(pdf.codes[0]!.filter((d) => d !== null && RECORD_URL.test(d))).toHaveLength(Math.min(17, perPage));
      expect(pdf.pages[0]).toContain(lot.code);
    }
    await labels('letter-3x5').expect(400);
  });

  it('opens the record of a jar from its QR code: for anyone, only what the jar needs', async () => {
    const pdf = await readPdf((await labels('letter-rect-2x4').expect(200)).body as Buffer);
    const url = pdf.codes[0]![2]!; // load 1, jar 3
    const path = new URL(url).pathname.replace(/^\/r\//, '/api/records/');
    const res = await request(t.http).get(path).expect(200);
    const record = res.body as JarRecordView;
    expect(Object.keys(record).sort()).toEqual(RECORD_KEYS);
    expect(record).toMatchObject({
      code: lot.code,
      jarNumber: 3,
      loadNumber: 1,
      product: lot.recipeName,
      dayDate: '2026-08-15',
      jarSize: 'half-pint',
      method: 'boiling-water',
      altitude: { value: 2100, unit: 'ft' },
      bestBy: '2027-08-15',
      seal: 'sealed',
      flagged: false,
      member: null,
    });
    // The time the rules gave the load at the day's altitude, as the live day ran it.
    expect(record.processMinutes).toBe(loadMinutes[0]);
    const text = JSON.stringify(record);
    for (const secret of [crew.kitchen.id, lot.id, dayId, ...loadIds, 'Test kitchen', 'Helper', 'Lead']) {
      expect(text).not.toContain(secret);
    }
    // Someone signed in who is not a member sees the same.
    const outsider = await request(t.http).get(path).set(crew.outsider.auth).expect(200);
    expect((outsider.body as JarRecordView).member).toBeNull();
  });

  it('adds the kitchen links for a member, and shows the unsealed jar and a spoilage flag', async () => {
    const pdf = await readPdf((await labels('letter-rect-2x4').expect(200)).body as Buffer);
    const token = RECORD_URL.exec(pdf.codes[0]![0]!)![1]!;
    const member = await request(t.http).get(`/api/records/${token}-1-1`).set(crew.watcher.auth).expect(200);
    expect((member.body as JarRecordView).member).toEqual({
      kitchenId: crew.kitchen.id,
      kitchenName: 'Test kitchen',
      lotId: lot.id,
      dayId,
      loadId: loadIds[0],
    });
    // A forged token is no sign-in: the record is still shown, without the member part.
    const forged = await request(t.http)
      .get(`/api/records/${token}-1-1`)
      .set({ Authorization: 'Bearer nope' })
      .expect(200);
    expect((forged.body as JarRecordView).member).toBeNull();

    const unsealed = (await request(t.http).get(`/api/records/${token}-1-6`).expect(200)).body as JarRecordView;
    expect(unsealed.seal).toBe('unsealed');
    const wholeLot = (await request(t.http).get(`/api/records/${token}`).expect(200)).body as JarRecordView;
    expect([wholeLot.jarNumber, wholeLot.loadNumber, wholeLot.seal]).toEqual([null, null, null]);

    await request(t.http)
      .post(`${base()}/lots/${lot.id}/entries`)
      .set(crew.helper.auth)
      .send({ kind: 'spoiled', jars: 1, date: '2026-09-01', note: 'Bulging lid' })
      .expect(201);
    const flagged = (await request(t.http).get(`/api/records/${token}-2-4`).expect(200)).body as JarRecordView;
    expect(flagged.flagged).toBe(true);
    expect(JSON.stringify(flagged)).not.toContain('Bulging lid');
  });

  it('answers 404 for a reference that names no jar, and for another kitchen’s lot labels', async () => {
    const pdf = await readPdf((await labels('letter-rect-2x4').expect(200)).body as Buffer);
    const token = RECORD_URL.exec(pdf.codes[0]![0]!)![1]!;
    await request(t.http).get('/api/records/AAAAAAAAAAAAAAAAAAAAAAAA-1-1').expect(404);
    await request(t.http).get(`/api/records/${token}-1-99`).expect(404);
    await request(t.http).get(`/api/records/${token}-7-1`).expect(404);
    await request(t.http).get('/api/records/short').expect(400);
    await request(t.http).get(`${base()}/lots/${lot.id}/labels.pdf`).set(crew.outsider.auth).expect(404);
    await request(t.http)
      .get(`/api/kitchens/${crew.otherKitchen.id}/lots/${lot.id}/labels.pdf`)
      .set(crew.outsider.auth)
      .expect(404);
    await request(t.http).get(`${base()}/lots/${lot.id}/labels.pdf`).expect(401);
  });
});
