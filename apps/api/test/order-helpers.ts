import { BakeDay } from '../src/db/models/index.js';
import { relayOutbox } from '../src/jobs/outbox-relay.js';
import { createMailTransport } from '../src/integrations/mailer.js';
import { database } from '../src/db/sequelize.js';
import type { BakeDayView } from '@fryline/schemas';
import type { Browser, Stack } from './support.js';

export const CARD_OK = { cardNumber: '4242424242424242', expiry: '12/34', cvc: '123' };

export async function openDay(stack: Stack): Promise<BakeDayView> {
  const days: BakeDayView[] = (await (await fetch(`${stack.url}/api/bake-days`)).json()) as any;
  const day = days.find((d) => d.status === 'open');
  if (!day) throw new Error('no open bake day in the demo');
  return day;
}

export function mixedDozen(day: BakeDayView, windowIndex = 0) {
  const rings = day.menu.filter((m) => m.kind === 'ring');
  return {
    bakeDayId: day.id,
    pickupWindowId: day.pickupWindows[windowIndex]!.id,
    boxes: [{ size: 'dozen', items: [{ menuItemId: rings[0]!.id, quantity: 6 }, { menuItemId: rings[1]!.id, quantity: 6 }] }],
  };
}

export function halfDozen(day: BakeDayView, windowIndex = 0) {
  const ring = day.menu.find((m) => m.kind === 'ring')!;
  return { bakeDayId: day.id, pickupWindowId: day.pickupWindows[windowIndex]!.id, boxes: [{ size: 'half-dozen', items: [{ menuItemId: ring.id, quantity: 6 }] }] };
}

export const sessionIdOf = (checkoutUrl: string) => checkoutUrl.split('/pay/')[1]!;

export async function remaining(dayId: string) {
  const day = await BakeDay.findByPk(dayId);
  return { rings: day!.ringsRemaining, holes: day!.holesRemaining };
}

/** Orders a box and pays it with the given card; waits until the webhooks are through. */
export async function orderAndPay(stack: Stack, browser: Browser, body: unknown, card = CARD_OK) {
  const created = await browser.send('POST', '/api/orders', body);
  if (created.status !== 201) throw new Error(`order failed: ${JSON.stringify(created.body)}`);
  const outcome = stack.payments.paySession(sessionIdOf(created.body.checkoutUrl), card);
  await stack.payments.webhooksIdle();
  return { order: created.body, outcome };
}

export async function deliverMail(stack: Stack) {
  const transport = createMailTransport({ SMTP_HOST: '127.0.0.1', SMTP_PORT: stack.mail.smtpPort });
  const result = await relayOutbox(database(), transport, 'orders@fryline.test', 100);
  transport.close();
  return result;
}
