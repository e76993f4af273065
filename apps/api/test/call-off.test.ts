import { beforeEach, describe, expect, it } from 'vitest';
import { AuditEntry, BakeDay, Order, Refund } from '../src/db/models/index.js';
import { createPaymentsClient } from '../src/integrations/payments.js';
import { JobStopped, runJobs } from '../src/jobs/job-runner.js';
import { Browser, signIn, useStack } from './support.js';
import { deliverMail, halfDozen, mixedDozen, openDay, orderAndPay, remaining } from './order-helpers.js';

const stack = useStack();
let owner: Browser;
beforeEach(async () => {
  owner = new Browser(stack.url);
  await signIn(owner, 'owner@fryline.test');
});

async function person(email: string) {
  const browser = new Browser(stack.url);
  await signIn(browser, email);
  return browser;
}

const payers = ['customer@fryline.test', 'june.plover@example.test', 'omar.teasdale@example.test', 'kit.marrow@example.test'];

describe('calling off a bake day', () => {
  it('refunds every paid order exactly once and e-mails every person once, even when the job is stopped halfway and started again', async () => {
    const day = await openDay(stack);
    const before = await remaining(day.id);
    const paid: Array<{ id: string; totalCents: number }> = [];
    for (const [i, email] of payers.entries()) {
      const { order } = await orderAndPay(stack, await person(email), i % 2 ? mixedDozen(day, i % day.pickupWindows.length) : halfDozen(day));
      paid.push(order);
    }
    // one box on hold, not paid; one person on the waitlist
    const holder = await person('lena.voss@example.test');
    const held = await holder.send('POST', '/api/orders', halfDozen(day));
    expect(held.status).toBe(201);
    const waiting = await person('waiting.wren@example.test');
    expect((await waiting.send('POST', `/api/bake-days/${day.id}/waitlist`, { rings: 6 })).status).toBe(201);

    const customer = await person(payers[0]!);
    expect((await customer.send('POST', `/api/staff/bake-days/${day.id}/call-off`, { reason: 'Storm warning' })).status).toBe(403);

    const started = await owner.send('POST', `/api/staff/bake-days/${day.id}/call-off`, { reason: 'Storm warning for Saturday' });
    expect(started.status).toBe(202);
    expect(started.body.jobId).toBe(started.body.id);
    const jobUrl = `/api/staff/jobs/${started.body.jobId}`;
    // 5 orders (4 paid, 1 held) and 6 people (5 customers, 1 on the waitlist)
    expect((await owner.getJson(jobUrl)).body).toMatchObject({ state: 'queued', done: 0, total: 11 });
    expect((await customer.getJson(jobUrl)).status).toBe(403);
    // the day stops selling at once
    expect((await (await person('late.comer@example.test')).send('POST', '/api/orders', halfDozen(day))).status).not.toBe(201);
    // asking twice gives the same job
    expect((await owner.send('POST', `/api/staff/bake-days/${day.id}/call-off`, { reason: 'again' })).body.jobId).toBe(started.body.jobId);

    // the runner dies during its third item, after the refund was made at the payments service but before it was recorded
    await expect(
      runJobs({
        afterItem: (n) => {
          if (n === 3) throw new JobStopped('stopped by the test');
        },
      }),
    ).rejects.toThrow(JobStopped);
    expect((await owner.getJson(jobUrl)).body).toMatchObject({ state: 'running', done: 2, total: 11 });

    // a new runner, once the dead one's lease has run out, finishes the job
    await runJobs({ now: () => new Date(Date.now() + 5 * 60_000) });
    expect((await owner.getJson(jobUrl)).body).toMatchObject({ state: 'done', done: 11, total: 11 });
    await stack.payments.webhooksIdle();

    // at the payments service: each paid order's payment has exactly one refund, for the whole amount
    const stripe = createPaymentsClient(stack.config);
    for (const order of paid) {
      const row = (await Order.findByPk(order.id))!;
      const refunds = await stripe.refunds.list({ payment_intent: row.paymentIntentId! });
      expect(refunds.data).toHaveLength(1);
      expect(refunds.data[0]!.amount).toBe(order.totalCents);
      expect(row).toMatchObject({ status: 'refunded', refundedCents: order.totalCents });
      // and our own record of it is there once, even for the refund made just before the stop
      expect(await Refund.count({ where: { orderId: order.id } })).toBe(1);
    }
    expect(stack.payments.events().filter((e) => e.type === 'refund.created')).toHaveLength(payers.length);
    expect((await Order.findByPk(held.body.id))!.status).toBe('cancelled');
    // every hold and sale released
    expect(await remaining(day.id)).toEqual(before);

    // at the mail service: each person exactly one message about it
    await deliverMail(stack);
    const told = stack.mail.messages().filter((m) => m.subject.includes('is called off'));
    const recipients = told.flatMap((m) => m.to).sort();
    expect(recipients).toEqual([...payers, 'lena.voss@example.test', 'waiting.wren@example.test'].sort());
    for (const [i, email] of payers.entries()) {
      const mail = told.find((m) => m.to.includes(email))!;
      expect(mail.text).toContain('Storm warning for Saturday');
      expect(mail.text).toContain(`refunded $${(paid[i]!.totalCents / 100).toFixed(2)} to your card`);
    }
    expect(told.find((m) => m.to.includes('waiting.wren@example.test'))!.text).toContain('nothing was charged');

    // a further run does nothing more
    await runJobs({ now: () => new Date(Date.now() + 60 * 60_000) });
    await deliverMail(stack);
    expect(stack.mail.messages().filter((m) => m.subject.includes('is called off'))).toHaveLength(6);
    expect((await stripe.refunds.list({ limit: 100 })).data).toHaveLength(payers.length);

    const dayRow = (await BakeDay.findByPk(day.id))!;
    expect(dayRow.status).toBe('cancelled');
    expect(await AuditEntry.count({ where: { action: 'bake_day.called_off', subjectId: day.id } })).toBe(1);
    expect(await AuditEntry.count({ where: { action: 'order.refunded' } })).toBe(payers.length);
    const listed = (await (await fetch(`${stack.url}/api/bake-days`)).json()) as Array<{ id: string }>;
    expect(listed.map((d) => d.id)).not.toContain(day.id);
  });

  it('a day with nothing sold is called off at once (a reason is not required): the job is done with nothing to do', async () => {
    const day = await openDay(stack);
    const res = await owner.send('POST', `/api/staff/bake-days/${day.id}/call-off`);
    expect(res.status).toBe(202);
    expect((await owner.getJson(`/api/staff/jobs/${res.body.jobId}`)).body).toMatchObject({ state: 'done', done: 0, total: 0 });
  });

  it('refuses a reason too long for an e-mail, and an unknown day', async () => {
    const day = await openDay(stack);
    expect((await owner.send('POST', `/api/staff/bake-days/${day.id}/call-off`, { reason: 'x'.repeat(301) })).status).toBe(400);
    expect((await owner.send('POST', `/api/staff/bake-days/00000000-0000-4000-8000-000000000000/call-off`, { reason: 'Rain all day' })).status).toBe(404);
    expect((await BakeDay.findByPk(day.id))!.status).toBe('published');
  });
});
