import { Router } from 'express';
import { z } from 'zod';
import { createOrderSchema, moveOrderSchema } from '@fryline/schemas';
import { currentUser, requireUser } from '../middleware/auth.js';
import { validate, valid } from '../middleware/validate.js';
import { cancelOrder, createOrder, getOrder, listOrders, moveOrder, resumeCheckout } from '../services/orders/orders.js';
import { pickupCalendar } from '../services/orders/calendar.js';
import { Order, BakeDay, PickupWindow } from '../db/models/index.js';
import { notFound } from '../lib/app-error.js';
import { shopSettings } from '../services/shop/settings.js';
import { context } from '../integrations/context.js';

export const ordersRouter = Router();
const idParams = z.object({ id: z.uuid('Unknown order') });
const createBody = createOrderSchema.extend({ claimToken: z.string().min(10).max(100).optional() });
const id = (res: Parameters<typeof valid>[0]) => valid<{ id: string }>(res, 'params').id;

ordersRouter.use('/api/orders', requireUser);

ordersRouter.get('/api/orders', async (req, res) => {
  res.json(await listOrders(currentUser(req), new Date()));
});

ordersRouter.post('/api/orders', validate('body', createBody), async (req, res) => {
  res.status(201).json(await createOrder(currentUser(req), valid(res, 'body'), new Date()));
});

ordersRouter.get('/api/orders/:id', validate('params', idParams), async (req, res) => {
  res.set('Cache-Control', 'no-store').json(await getOrder(currentUser(req), id(res), new Date()));
});

ordersRouter.post('/api/orders/:id/cancel', validate('params', idParams), async (req, res) => {
  res.json(await cancelOrder(currentUser(req), id(res), new Date()));
});

ordersRouter.post('/api/orders/:id/move', validate('params', idParams), validate('body', moveOrderSchema), async (req, res) => {
  res.json(await moveOrder(currentUser(req), id(res), valid<{ pickupWindowId: string }>(res, 'body').pickupWindowId, new Date()));
});

ordersRouter.post('/api/orders/:id/checkout', validate('params', idParams), async (req, res) => {
  res.json(await resumeCheckout(currentUser(req), id(res), new Date()));
});

ordersRouter.get('/api/orders/:id/calendar.ics', validate('params', idParams), async (req, res) => {
  const order = await Order.findOne({
    where: { id: id(res), userId: currentUser(req).id },
    include: [{ model: BakeDay, as: 'bakeDay' }, { model: PickupWindow, as: 'pickupWindow' }],
  });
  if (!order || !order.pickupCode || !['paid', 'collected'].includes(order.status)) throw notFound('Order');
  const { shopName } = await shopSettings();
  const ics = pickupCalendar({
    orderId: order.id,
    code: order.pickupCode,
    shopName,
    place: order.bakeDay!.place,
    address: order.bakeDay!.address,
    startsAt: order.pickupWindow!.startsAt,
    endsAt: order.pickupWindow!.endsAt,
    url: `${context().config.publicUrl}/orders/${order.id}`,
  });
  res.type('text/calendar').attachment('pickup.ics').send(ics);
});
