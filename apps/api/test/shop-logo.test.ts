import { beforeEach, describe, expect, it } from 'vitest';
import sharp from 'sharp';
import { JSDOM } from 'jsdom';
import { formatCents } from '@fryline/schemas';
import { QueryTypes } from 'sequelize';
import { AuditEntry, Order, ShopSettings } from '../src/db/models/index.js';
import { database } from '../src/db/sequelize.js';
import { countPhotoRows } from '../src/db/queries/menu-photos.js';
import { context } from '../src/integrations/context.js';
import { Browser, signIn, useStack } from './support.js';
import { signedInAgent, type Agent } from './owner-helpers.js';
import { CARD_OK, deliverMail, halfDozen, openDay, orderAndPay, sessionIdOf } from './order-helpers.js';

const stack = useStack();
const SHOP = 'Lantern Lane Doughnuts'; // our own fictional business
let owner: Agent;
beforeEach(async () => {
  await ShopSettings.update({ shopName: SHOP }, { where: { id: 1 } });
  owner = await signedInAgent(stack, 'owner@fryline.test');
});

/** A wide PNG logo with a transparent background and an EXIF camera make, made by sharp. */
async function logoPng(): Promise<Buffer> {
  const svg = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" width="900" height="300"><circle cx="150" cy="150" r="120" fill="#56305f"/><rect x="320" y="110" width="520" height="80" fill="#b0651a"/></svg>');
  return sharp(svg).png().withExif({ IFD0: { Make: 'Sketchpad', Software: 'LogoMaker 3' } }).toBuffer();
}

const shop = async () => (await (await fetch(`${stack.url}/api/shop`)).json()) as any;

/** A customer pays for a half dozen; the confirmation e-mail of that order (not an earlier one), parsed. */
async function confirmationMail(email = 'customer@fryline.test') {
  const customer = new Browser(stack.url);
  await signIn(customer, email);
  const { order } = await orderAndPay(stack, customer, halfDozen(await openDay(stack)));
  const { pickupCode } = (await customer.getJson(`/api/orders/${order.id}`)).body;
  await deliverMail(stack);
  const mail = await stack.mail.waitFor((m) => m.subject.startsWith('Your pickup code') && (m.text ?? '').includes(pickupCode), 5000);
  return { mail, doc: new JSDOM(mail.html ?? '').window.document };
}

describe('the shop’s logo', () => {
  it('takes a real PNG: resized to WebP at 120/240/480 px, EXIF gone, shown by GET /api/shop with its shape, then taken down', async () => {
    expect((await shop()).logoUrl).toBeNull();
    const res = await owner.post('/api/staff/shop-settings/logo').attach('logo', await logoPng(), { filename: 'logo.png', contentType: 'image/png' });
    expect(res.status).toBe(201);
    // 900 × 300 is 3:1, so each size keeps a third of its width as height
    expect(res.body.files.map((f: any) => [f.width, f.height])).toEqual([[120, 40], [240, 80], [480, 160]]);
    for (const file of res.body.files) {
      const bytes = Buffer.from(await (await fetch(`${stack.url}${file.url}`)).arrayBuffer());
      const meta = await sharp(bytes).metadata();
      expect(meta).toMatchObject({ format: 'webp', width: file.width, height: file.height, hasAlpha: true });
      expect(meta.exif).toBeUndefined();
      expect(bytes.includes(Buffer.from('Sketchpad'))).toBe(false);
    }
    const after = await shop();
    expect(after.name).toBe(SHOP);
    expect(after.logoUrl).toBe(res.body.src);
    expect(after.logo).toMatchObject({ width: 480, height: 160, srcset: res.body.srcset });
    expect(await AuditEntry.count({ where: { action: 'shop.logo' } })).toBe(1);

    // a second logo replaces the first, whose files go
    const again = await owner.post('/api/staff/shop-settings/logo').attach('logo', await sharp({ create: { width: 200, height: 200, channels: 3, background: '#3b6642' } }).jpeg().toBuffer(), 'square.jpg');
    expect(again.status).toBe(201);
    expect(again.body.files.map((f: any) => f.width)).toEqual([120, 200]);
    expect((await fetch(`${stack.url}${res.body.urls[0]}`)).status).toBe(404);

    expect((await owner.delete('/api/staff/shop-settings/logo')).status).toBe(204);
    const gone = await shop();
    expect(gone.logoUrl).toBeNull();
    expect(gone).not.toHaveProperty('logo');
    expect(await countPhotoRows()).toEqual({ photos: 0, files: 0 });
    expect(await AuditEntry.count({ where: { action: 'shop.logo_removed' } })).toBe(1);
  });

  it.each([
    ['a text file named .png', () => Buffer.from('not a picture\n'.repeat(100)), 'logo', 415, 'unsupported_type'],
    ['a 20 MB file', () => Buffer.alloc(20 * 1024 * 1024, 1), 'logo', 413, 'too_large'],
    ['a logo in the wrong field', logoPng, 'photo', 400, 'wrong_field'],
  ] as const)('refuses %s and stores nothing', async (_what, bytes, field, status, code) => {
    const res = await owner.post('/api/staff/shop-settings/logo').attach(field, await bytes(), 'logo.png');
    expect(res.status).toBe(status);
    expect(res.body.error.code).toBe(code);
    expect(await countPhotoRows()).toEqual({ photos: 0, files: 0 });
    expect((await ShopSettings.findByPk(1))!.logoPhotoId).toBeNull();
  });

  it('lets only the owner put one up or take it down', async () => {
    for (const email of ['baker@fryline.test', 'counter@fryline.test', 'customer@fryline.test']) {
      const someone = await signedInAgent(stack, email);
      expect((await someone.post('/api/staff/shop-settings/logo').attach('logo', await logoPng(), 'logo.png')).status).toBe(403);
      expect((await someone.delete('/api/staff/shop-settings/logo')).status).toBe(403);
    }
    expect(await countPhotoRows()).toEqual({ photos: 0, files: 0 });
  });

  it('heads the e-mails when set (an absolute URL on the public address, alt text the name), and not when unset', async () => {
    const without = await confirmationMail();
    expect(without.doc.querySelector(`img[alt="${SHOP}"]`)).toBeNull();

    const res = await owner.post('/api/staff/shop-settings/logo').attach('logo', await logoPng(), 'logo.png');
    expect(res.status).toBe(201);
    const { doc } = await confirmationMail('another.customer@fryline.test');
    const img = doc.querySelector(`img[alt="${SHOP}"]`);
    expect(img).not.toBeNull();
    const src = img!.getAttribute('src')!;
    expect(src).toBe(`${context().config.publicUrl}${res.body.files[1].url}`);
    expect(src).toMatch(/^https?:\/\//);
    expect(img!.getAttribute('width')).toBe('120');
  });
});

describe('the shop’s currency', () => {
  it('shows euros in GET /api/shop and in the confirmation e-mail (bill and text part), as Intl.NumberFormat writes them (ECMA-402)', async () => {
    await ShopSettings.update({ currency: 'eur' }, { where: { id: 1 } });
    expect((await shop()).currency).toBe('eur');
    const { mail, doc } = await confirmationMail();
    const total = Number(doc.querySelector('[data-mail="bill-total"]')!.getAttribute('data-cents'));
    const euros = new Intl.NumberFormat('en-US', { style: 'currency', currency: 'EUR' }).format(total / 100);
    expect(formatCents(total, 'eur')).toBe(euros);
    expect(doc.querySelector('[data-mail="bill-total"]')!.textContent).toContain(euros);
    expect(mail.text).toContain(euros);
    expect(mail.text).not.toContain(formatCents(total, 'usd'));
  });

  it('an order keeps the currency it was priced in: paid in dollars after the shop switches to euros, it is paid (not flagged), and says dollars; the next order is charged in euros', async () => {
    const customer = new Browser(stack.url);
    await signIn(customer, 'customer@fryline.test');
    const day = await openDay(stack);
    const created = await customer.send('POST', '/api/orders', halfDozen(day));
    expect(created.status).toBe(201);
    expect(created.body.status).toBe('held');
    const sessionId = sessionIdOf(created.body.checkoutUrl);
    expect((await context().payments.checkout.sessions.retrieve(sessionId)).currency).toBe('usd');

    await ShopSettings.update({ currency: 'eur' }, { where: { id: 1 } });
    stack.payments.paySession(sessionId, CARD_OK);
    await stack.payments.webhooksIdle();
    const order = (await customer.getJson(`/api/orders/${created.body.id}`)).body;
    expect(order.status).toBe('paid');
    expect(order.currency).toBe('usd');
    const flags = await database().query('SELECT 1 FROM payment_flags WHERE order_id = :id', { replacements: { id: created.body.id }, type: QueryTypes.SELECT });
    expect(flags).toEqual([]);
    const owner = new Browser(stack.url);
    await signIn(owner, 'owner@fryline.test');
    const listed = (await owner.getJson(`/api/staff/bake-days/${day.id}/orders`)).body as Array<{ id: string; currency: string }>;
    expect(listed.find((o) => o.id === created.body.id)?.currency).toBe('usd');

    const next = new Browser(stack.url);
    await signIn(next, 'another.customer@fryline.test');
    const second = await next.send('POST', '/api/orders', halfDozen(day));
    expect(second.status).toBe(201);
    expect((await Order.findByPk(second.body.id))!.currency).toBe('eur');
    expect((await context().payments.checkout.sessions.retrieve(sessionIdOf(second.body.checkoutUrl))).currency).toBe('eur');
  });
});
