import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { paySession, sessionParams, singleItem, startFake } from './test-support/fixture.js';

const dirs: string[] = [];
afterEach(() => {
  for (const dir of dirs.splice(0)) fs.rmSync(dir, { recursive: true, force: true });
});
function tempFile() {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'payments-fake-state-'));
  dirs.push(dir);
  return path.join(dir, 'nested', 'payments.json');
}

describe('state kept in a file', () => {
  it('a restarted fake still knows the sessions, payments, refunds, events and answered idempotency keys', async () => {
    const stateFile = tempFile();
    const first = await startFake({ stateFile });
    expect(first.fake.restored).toBe(false);
    const session = await first.stripe.checkout.sessions.create(sessionParams({ line_items: singleItem(3250) }));
    const paid = await paySession(first.fake, session.id, '4242424242424242');
    expect(paid.status).toBe(200);
    const intent = paid.body.payment_intent.id as string;
    const refund = await first.stripe.refunds.create({ payment_intent: intent, amount: 1000 }, { idempotencyKey: 'refund-once' });
    await first.fake.close();

    // the file is whole JSON and no temporary file is left beside it
    expect(() => JSON.parse(fs.readFileSync(stateFile, 'utf8'))).not.toThrow();
    expect(fs.readdirSync(path.dirname(stateFile))).toEqual(['payments.json']);

    const second = await startFake({ stateFile });
    try {
      expect(second.fake.restored).toBe(true);
      const again = await second.stripe.checkout.sessions.retrieve(session.id);
      expect(again).toMatchObject({ status: 'complete', payment_status: 'paid', amount_total: 3250, payment_intent: intent });
      const charge = await second.stripe.charges.retrieve(paid.body.charge.id);
      expect(charge.amount_refunded).toBe(1000);
      const events = await second.stripe.events.list({ limit: 100 });
      expect(events.data.map((e) => e.type)).toEqual(expect.arrayContaining(['checkout.session.completed', 'charge.refunded']));
      // the same key replays the first answer instead of refunding again
      const replay = await second.stripe.refunds.create({ payment_intent: intent, amount: 1000 }, { idempotencyKey: 'refund-once' });
      expect(replay.id).toBe(refund.id);
      expect((await second.stripe.refunds.list({ payment_intent: intent })).data).toHaveLength(1);
      // and what is left can still be refunded: 3250 − 1000 = 2250
      const rest = await second.stripe.refunds.create({ payment_intent: intent });
      expect(rest.amount).toBe(2250);
    } finally {
      await second.fake.close();
    }
  });

  it('refuses to start on a damaged file rather than silently forgetting', async () => {
    const stateFile = tempFile();
    fs.mkdirSync(path.dirname(stateFile), { recursive: true });
    fs.writeFileSync(stateFile, '{"store": {"version": 1, "sess');
    await expect(startFake({ stateFile })).rejects.toThrow(/not valid JSON/);
  });
});
