import { Router } from 'express';
import { api } from '@fryline/schemas';
import { currentUser, requireUser } from '../middleware/auth.js';
import { route } from '../lib/route.js';
import { cancelOrder, createOrder, getOrder, listOrders, moveOrder, resumeCheckout } from '../services/orders/orders.js';
import { orderCalendar } from '../services/orders/calendar.js';

/** /api/orders: a customer's own orders. */
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
