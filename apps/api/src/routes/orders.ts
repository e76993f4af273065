import { Router } from 'express';
import { api } from '@fryline/schemas';
import { currentUser, requireRole, requireUser } from '../middleware/auth.js';
import { route } from '../lib/route.js';
import { cancelOrder, createOrder, getOrder, listOrders, moveOrder, resumeCheckout } from '../services/orders/orders.js';
import { orderCalendar } from '../services/orders/calendar.js';
import { findByCode } from '../services/counter/pickups.js';
import { changeOrder, type CounterAction } from '../services/counter/hand-over.js';
import { idempotencyKey } from '../services/counter/idempotency.js';

/** /api/orders: a customer's own orders, and the counter's look-up and hand-over of any order. */
export const ordersRouter = Router();

ordersRouter.use('/api/orders', requireUser);

route(ordersRouter, api.listOrders, [], ({ req, now }) => listOrders(currentUser(req), now));

route(ordersRouter, api.createOrder, [], ({ req, body, now }) => createOrder(currentUser(req), body, now));

route(ordersRouter, api.getOrder, [], ({ req, params, now }) => getOrder(currentUser(req), params.id, now), { noStore: true });

route(ordersRouter, api.cancelOrder, [], ({ req, params, now }) => cancelOrder(currentUser(req), params.id, now));

route(ordersRouter, api.moveOrder, [], ({ req, params, body, now }) => moveOrder(currentUser(req), params.id, body.pickupWindowId, now));

route(ordersRouter, api.resumeCheckout, [], ({ req, params, now }) => resumeCheckout(currentUser(req), params.id, now));

route(ordersRouter, api.orderCalendar, [], ({ req, params }) => orderCalendar(currentUser(req), params.id), {
  send: (res, ics) => res.type('text/calendar').attachment('pickup.ics').send(ics),
});

// the counter (counter and up): find by pickup code, hand over, undo, no-show and its reversal
const counter = [requireRole('counter')];

route(ordersRouter, api.findOrderByCode, counter, ({ params, now }) => findByCode(params.code, now), { noStore: true });

const changes: Array<[CounterAction, typeof api.collectOrder | typeof api.uncollectOrder | typeof api.markNoShow | typeof api.reverseNoShow]> = [
  ['collect', api.collectOrder],
  ['uncollect', api.uncollectOrder],
  ['no-show', api.markNoShow],
  ['reverse-no-show', api.reverseNoShow],
];
for (const [action, endpoint] of changes) {
  route(ordersRouter, endpoint, counter, ({ req, params, body, now }) =>
    changeOrder(action, { user: currentUser(req), now, orderId: params.id, bakeDayId: body?.bakeDayId ?? null, key: idempotencyKey(req) }),
  );
}
