import { describe, expect, it } from 'vitest';
import { OutboxMessage, PickupWindow } from '../src/db/models/index.js';
import { queueReminders } from '../src/jobs/reminders.js';
import { Browser, signIn, useStack } from './support.js';
import { halfDozen, openDay, orderAndPay } from './order-helpers.js';

const stack = useStack();

describe('the day-before reminder', () => {
  it('is queued once for a paid order whose pickup starts within a day, and not for later ones', async () => {
    const day = await openDay(stack);
    const customer = new Browser(stack.url);
    await signIn(customer, 'customer@fryline.test');
    const { order } = await orderAndPay(stack, customer, halfDozen(day, 0));
    const window = await PickupWindow.findByPk(day.pickupWindows[0]!.id);
    const start = window!.startsAt.getTime();
    expect(await queueReminders(new Date(start - 30 * 3600_000))).toBe(0);
    expect(await queueReminders(new Date(start - 20 * 3600_000))).toBe(1);
    expect(await queueReminders(new Date(start - 19 * 3600_000))).toBe(0);
    const reminders = await OutboxMessage.findAll({ where: { kind: 'reminder' } });
    expect(reminders).toHaveLength(1);
    const paid = await customer.getJson(`/api/orders/${order.id}`);
    expect(reminders[0]!.textBody).toContain(paid.body.pickupCode);
  });
});
