import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { BakeDay } from '../src/db/models/index.js';
import { setClock } from '../src/integrations/context.js';
import { Browser, signIn, useStack } from './support.js';
import { halfDozen, openDay, remaining } from './order-helpers.js';

// One clock for the whole path: the request reads it once and passes it to
// the services and into the capacity UPDATE as a parameter, so moving it
// moves time for the route, the service and the SQL alike.
const stack = useStack();
let customer: Browser;
beforeEach(async () => {
  customer = new Browser(stack.url);
  await signIn(customer, 'customer@fryline.test');
});
afterEach(() => setClock());

describe('one clock', () => {
  it('takes pieces when the moved clock is inside the ordering window, though the database clock is before it', async () => {
    const day = await openDay(stack);
    const opens = new Date(Date.now() + 3600_000);
    await BakeDay.update({ ordersOpenAt: opens, cutoffAt: new Date(opens.getTime() + 3600_000) }, { where: { id: day.id } });
    // by the real time the day is not open yet
    expect((await customer.send('POST', '/api/orders', halfDozen(day))).body.error.code).toBe('closed');
    setClock(new Date(opens.getTime() + 30 * 60_000));
    const res = await customer.send('POST', '/api/orders', halfDozen(day));
    expect(res.status).toBe(201);
    expect(await remaining(day.id)).toEqual({ rings: day.remaining.rings - 6, holes: day.remaining.holes });
    // the hold runs from the moved clock
    expect(new Date(res.body.holdExpiresAt).getTime() - (opens.getTime() + 30 * 60_000)).toBe(stack.config.HOLD_MINUTES * 60_000);
  });

  it('refuses pieces when the moved clock is past the cut-off, though the database clock is before it, and changes nothing', async () => {
    const day = await openDay(stack);
    const cutoff = new Date(day.cutoffAt);
    setClock(new Date(cutoff.getTime() + 60_000));
    expect((await customer.send('GET', `/api/bake-days/${day.id}`)).body.status).toBe('closed');
    const res = await customer.send('POST', '/api/orders', halfDozen(day));
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('closed');
    expect(await remaining(day.id)).toEqual(day.remaining);
  });
});
