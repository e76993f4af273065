import { z } from 'zod';
import { bakeDayViewSchema } from './bake-days.js';
import {
  checkoutLinkSchema, createOrderSchema, createdOrderSchema, joinWaitlistSchema, joinedWaitlistSchema, moveOrderSchema, orderDetailSchema,
  refundRequestSchema, refundViewSchema, staffOrderViewSchema, waitlistEntryViewSchema, waitlistOfferViewSchema,
} from './orders.js';
import {
  capacityOverrideSchema, capacityResultSchema, equipmentCapacitySchema, formulaListSchema, formulaVersionViewSchema, pinFormulaSchema,
  planResponseSchema, productionSettingsSchema, productionSettingsViewSchema, saveFormulaSchema,
} from './production.js';
import { meSchema } from './roles.js';
import {
  bakeDayEditResultSchema, bakeDayEditViewSchema, callOffSchema, callOffStartedSchema, confirmedSchema, editBakeDaySchema, jobViewSchema, subscribeSchema,
  subscribedSchema, tokenSchema, unsubscribedSchema, weekQuerySchema, weeklyReportSchema,
} from './owner-ops.js';
import {
  counterActionSchema, counterSettingsSchema, endOfDaySchema, markRestNoShowResultSchema, markRestNoShowSchema, orderByCodeSchema, pickupRowSchema, surplusSchema,
  walkUpSaleSchema, walkUpSaleViewSchema,
} from './counter.js';
import { changeRoleSchema, createBakeDaySchema, menuItemAdminViewSchema, staffMemberInputSchema, staffMemberViewSchema } from './setup.js';
import { menuItemInputSchema, menuItemPatchSchema, menuPhotoViewSchema } from './menu.js';
import { publicShopViewSchema, shopLogoViewSchema, shopSettingsInputSchema, shopSettingsViewSchema } from './shop-settings.js';
import { auditPageSchema, auditQuerySchema } from './audit-log.js';

/**
 * The contract between the apps and the API: every JSON endpoint with its
 * request schemas (params, query, body) and its response schema. The API's
 * route helper ties each handler to one entry, so a handler gets parsed
 * input and must return the response type; the apps' query functions take
 * their types from the same entry.
 */

export type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

export interface Endpoint {
  method: Method;
  path: string;
  params?: z.ZodType;
  query?: z.ZodType;
  body?: z.ZodType;
  /** The body of a success; an endpoint that may answer 204 No Content makes it optional. */
  response: z.ZodType;
  /** Success status (200 unless said; 202 when work was queued). */
  status?: 200 | 201 | 202;
}

const endpoint = <const E extends Endpoint>(e: E): E => e;

/** The parsed value of one request part (after defaults and transforms). */
export type ParamsOf<E extends Endpoint> = E['params'] extends z.ZodType ? z.output<E['params']> : Record<string, never>;
export type QueryOf<E extends Endpoint> = E['query'] extends z.ZodType ? z.output<E['query']> : Record<string, never>;
export type BodyOf<E extends Endpoint> = E['body'] extends z.ZodType ? z.output<E['body']> : undefined;
/** What a client sends as the body. */
export type BodyInput<E extends Endpoint> = E['body'] extends z.ZodType ? z.input<E['body']> : never;
/** What the endpoint answers. */
export type ResponseOf<E extends Endpoint> = z.output<E['response']>;

const uuidParams = (what: string) => z.object({ id: z.uuid(`Unknown ${what}`) });
const bakeDayParams = uuidParams('bake day');
const orderParams = uuidParams('order');

export const api = {
  // health and session
  health: endpoint({ method: 'get', path: '/api/health', response: z.object({ ok: z.boolean(), db: z.enum(['up', 'down']) }) }),
  csrf: endpoint({ method: 'get', path: '/api/csrf', response: z.object({ token: z.string() }) }),
  me: endpoint({ method: 'get', path: '/api/me', response: meSchema }),

  // bake days as customers see them
  listBakeDays: endpoint({ method: 'get', path: '/api/bake-days', response: z.array(bakeDayViewSchema) }),
  getBakeDay: endpoint({ method: 'get', path: '/api/bake-days/:id', params: bakeDayParams, response: bakeDayViewSchema }),
  joinWaitlist: endpoint({ method: 'post', path: '/api/bake-days/:id/waitlist', params: uuidParams('bake day'), body: joinWaitlistSchema, response: joinedWaitlistSchema, status: 201 }),

  // a bake day's production
  getPlan: endpoint({ method: 'get', path: '/api/bake-days/:id/plan', params: bakeDayParams, response: planResponseSchema }),
  pinFormula: endpoint({ method: 'post', path: '/api/bake-days/:id/formula', params: bakeDayParams, body: pinFormulaSchema, response: planResponseSchema }),
  setCapacity: endpoint({ method: 'post', path: '/api/bake-days/:id/capacity', params: bakeDayParams, body: capacityOverrideSchema, response: capacityResultSchema }),

  // a customer's orders
  listOrders: endpoint({ method: 'get', path: '/api/orders', response: z.array(orderDetailSchema) }),
  createOrder: endpoint({
    method: 'post',
    path: '/api/orders',
    body: createOrderSchema.extend({ claimToken: z.string().min(10).max(100).optional() }),
    response: createdOrderSchema,
    status: 201,
  }),
  getOrder: endpoint({ method: 'get', path: '/api/orders/:id', params: orderParams, response: orderDetailSchema }),
  cancelOrder: endpoint({ method: 'post', path: '/api/orders/:id/cancel', params: orderParams, response: orderDetailSchema }),
  moveOrder: endpoint({ method: 'post', path: '/api/orders/:id/move', params: orderParams, body: moveOrderSchema, response: orderDetailSchema }),
  resumeCheckout: endpoint({ method: 'post', path: '/api/orders/:id/checkout', params: orderParams, response: checkoutLinkSchema }),
  /** text/calendar (RFC 5545), not JSON. */
  orderCalendar: endpoint({ method: 'get', path: '/api/orders/:id/calendar.ics', params: orderParams, response: z.string() }),

  // the waiting list
  listWaitlist: endpoint({ method: 'get', path: '/api/waitlist', response: z.array(waitlistEntryViewSchema) }),
  leaveWaitlist: endpoint({ method: 'delete', path: '/api/waitlist/:id', params: uuidParams('waitlist entry'), response: z.void() }),
  getOffer: endpoint({ method: 'get', path: '/api/waitlist/claims/:token', params: z.object({ token: z.string().min(10).max(100) }), response: waitlistOfferViewSchema }),

  // staff: bake days
  listPastBakeDays: endpoint({ method: 'get', path: '/api/staff/bake-days/past', response: z.array(bakeDayViewSchema) }),
  listDraftBakeDays: endpoint({ method: 'get', path: '/api/staff/bake-days/drafts', response: z.array(bakeDayViewSchema) }),
  createBakeDay: endpoint({ method: 'post', path: '/api/staff/bake-days', body: createBakeDaySchema, response: bakeDayViewSchema, status: 201 }),
  publishBakeDay: endpoint({ method: 'post', path: '/api/staff/bake-days/:id/publish', params: uuidParams('bake day'), response: bakeDayViewSchema }),
  listBakeDayOrders: endpoint({ method: 'get', path: '/api/staff/bake-days/:id/orders', params: bakeDayParams, response: z.array(staffOrderViewSchema) }),

  // staff: orders (the Idempotency-Key header, 8–100 characters, is required)
  refundOrder: endpoint({ method: 'post', path: '/api/staff/orders/:id/refunds', params: orderParams, body: refundRequestSchema, response: refundViewSchema, status: 201 }),

  // staff: menu and members
  listMenuItems: endpoint({ method: 'get', path: '/api/staff/menu-items', response: z.array(menuItemAdminViewSchema) }),
  listStaff: endpoint({ method: 'get', path: '/api/staff/members', response: z.array(staffMemberViewSchema) }),
  addStaff: endpoint({ method: 'post', path: '/api/staff/members', body: staffMemberInputSchema, response: staffMemberViewSchema, status: 201 }),
  /** 204 when the member is no longer staff (made a customer). */
  changeRole: endpoint({ method: 'patch', path: '/api/staff/members/:id', params: uuidParams('staff member'), body: changeRoleSchema, response: staffMemberViewSchema.optional() }),

  /** Sends the invitation e-mail again, for someone who has not signed in yet. */
  resendInvitation: endpoint({ method: 'post', path: '/api/staff/members/:id/invitation', params: uuidParams('person'), response: z.object({ queued: z.literal(true) }), status: 202 }),

  // staff: the menu (the owner changes it; bakers read it)
  getMenuItem: endpoint({ method: 'get', path: '/api/staff/menu-items/:id', params: uuidParams('menu item'), response: menuItemAdminViewSchema }),
  createMenuItem: endpoint({ method: 'post', path: '/api/staff/menu-items', body: menuItemInputSchema, response: menuItemAdminViewSchema, status: 201 }),
  updateMenuItem: endpoint({ method: 'patch', path: '/api/staff/menu-items/:id', params: uuidParams('menu item'), body: menuItemPatchSchema, response: menuItemAdminViewSchema }),
  archiveMenuItem: endpoint({ method: 'post', path: '/api/staff/menu-items/:id/archive', params: uuidParams('menu item'), response: menuItemAdminViewSchema }),
  restoreMenuItem: endpoint({ method: 'post', path: '/api/staff/menu-items/:id/restore', params: uuidParams('menu item'), response: menuItemAdminViewSchema }),
  /** multipart/form-data with the file in field "photo" (not JSON): JPEG, PNG or WebP by content, at most 8 MB; 415, 413 or 400 otherwise. */
  uploadMenuPhoto: endpoint({ method: 'post', path: '/api/staff/menu-items/:id/photo', params: uuidParams('menu item'), response: menuPhotoViewSchema, status: 201 }),
  removeMenuPhoto: endpoint({ method: 'delete', path: '/api/staff/menu-items/:id/photo', params: uuidParams('menu item'), response: z.void() }),

  // the shop's settings
  /** The business the shop belongs to: its name and logo, for the storefront's header, titles and footer, and the terms shown before paying. */
  getShop: endpoint({ method: 'get', path: '/api/shop', response: publicShopViewSchema }),
  getShopSettings: endpoint({ method: 'get', path: '/api/staff/shop-settings', response: shopSettingsViewSchema }),
  saveShopSettings: endpoint({ method: 'put', path: '/api/staff/shop-settings', body: shopSettingsInputSchema, response: shopSettingsViewSchema }),
  /** multipart/form-data with the image in field "logo" (not JSON): JPEG, PNG or WebP by content, at most 8 MB; 415, 413 or 400 otherwise. Replaces any logo. */
  uploadShopLogo: endpoint({ method: 'post', path: '/api/staff/shop-settings/logo', response: shopLogoViewSchema, status: 201 }),
  removeShopLogo: endpoint({ method: 'delete', path: '/api/staff/shop-settings/logo', response: z.void() }),

  // who changed what
  listAuditLog: endpoint({ method: 'get', path: '/api/staff/audit-log', query: auditQuerySchema, response: auditPageSchema }),

  // production settings and formulas
  getProductionSettings: endpoint({ method: 'get', path: '/api/production/settings', response: productionSettingsViewSchema }),
  saveProductionSettings: endpoint({ method: 'put', path: '/api/production/settings', body: productionSettingsSchema, response: productionSettingsViewSchema }),
  getEquipmentCapacity: endpoint({ method: 'get', path: '/api/production/capacity', response: equipmentCapacitySchema }),
  listFormulas: endpoint({ method: 'get', path: '/api/production/formulas', response: formulaListSchema }),
  saveFormula: endpoint({ method: 'post', path: '/api/production/formulas', body: saveFormulaSchema, response: formulaVersionViewSchema, status: 201 }),

  // the owner changes, calls off, opens, closes or finishes a bake day, and follows the call-off's job
  getBakeDayForEdit: endpoint({ method: 'get', path: '/api/staff/bake-days/:id', params: bakeDayParams, response: bakeDayEditViewSchema }),
  editBakeDay: endpoint({ method: 'patch', path: '/api/staff/bake-days/:id', params: bakeDayParams, body: editBakeDaySchema, response: bakeDayEditResultSchema }),
  openBakeDayNow: endpoint({ method: 'post', path: '/api/staff/bake-days/:id/open-now', params: bakeDayParams, response: bakeDayEditResultSchema }),
  closeBakeDayNow: endpoint({ method: 'post', path: '/api/staff/bake-days/:id/close-now', params: bakeDayParams, response: bakeDayEditResultSchema }),
  markBakeDayDone: endpoint({ method: 'post', path: '/api/staff/bake-days/:id/mark-done', params: bakeDayParams, response: bakeDayEditResultSchema }),
  callOffBakeDay: endpoint({ method: 'post', path: '/api/staff/bake-days/:id/call-off', params: bakeDayParams, body: callOffSchema, response: callOffStartedSchema, status: 202 }),
  getJob: endpoint({ method: 'get', path: '/api/staff/jobs/:id', params: uuidParams('job'), response: jobViewSchema }),

  // news of new bake days: double opt-in, and the RFC 8058 one-click unsubscribe address (token in the query)
  subscribeToNews: endpoint({ method: 'post', path: '/api/announcements/subscribe', body: subscribeSchema, response: subscribedSchema, status: 202 }),
  confirmNews: endpoint({ method: 'post', path: '/api/announcements/confirm', body: tokenSchema, response: confirmedSchema }),
  unsubscribeFromNews: endpoint({ method: 'post', path: '/api/announcements/unsubscribe', query: tokenSchema, response: unsubscribedSchema }),

  // the week's sales (owner); the CSV (RFC 4180) is text, not JSON
  weeklySales: endpoint({ method: 'get', path: '/api/reports/weekly', query: weekQuerySchema, response: weeklyReportSchema }),
  weeklySalesCsv: endpoint({ method: 'get', path: '/api/reports/weekly.csv', query: weekQuerySchema, response: z.string() }),
  // the counter on bake day (counter and up); changes take an optional Idempotency-Key
  listPickups: endpoint({ method: 'get', path: '/api/bake-days/:id/pickups', params: bakeDayParams, response: z.array(pickupRowSchema) }),
  getSurplus: endpoint({ method: 'get', path: '/api/bake-days/:id/surplus', params: bakeDayParams, response: surplusSchema }),
  sellWalkUp: endpoint({ method: 'post', path: '/api/bake-days/:id/walk-ups', params: bakeDayParams, body: walkUpSaleSchema, response: walkUpSaleViewSchema, status: 201 }),
  markRestNoShow: endpoint({ method: 'post', path: '/api/bake-days/:id/no-shows', params: bakeDayParams, body: markRestNoShowSchema, response: markRestNoShowResultSchema }),
  getEndOfDay: endpoint({ method: 'get', path: '/api/bake-days/:id/end-of-day', params: bakeDayParams, response: endOfDaySchema }),
  findOrderByCode: endpoint({ method: 'get', path: '/api/orders/by-code/:code', params: z.object({ code: z.string().trim().min(1).max(40) }), response: orderByCodeSchema }),
  collectOrder: endpoint({ method: 'post', path: '/api/orders/:id/collect', params: orderParams, body: counterActionSchema, response: pickupRowSchema }),
  uncollectOrder: endpoint({ method: 'post', path: '/api/orders/:id/uncollect', params: orderParams, body: counterActionSchema, response: pickupRowSchema }),
  markNoShow: endpoint({ method: 'post', path: '/api/orders/:id/no-show', params: orderParams, body: counterActionSchema, response: pickupRowSchema }),
  reverseNoShow: endpoint({ method: 'post', path: '/api/orders/:id/reverse-no-show', params: orderParams, body: counterActionSchema, response: pickupRowSchema }),
  getCounterSettings: endpoint({ method: 'get', path: '/api/counter/settings', response: counterSettingsSchema }),
  saveCounterSettings: endpoint({ method: 'put', path: '/api/counter/settings', body: counterSettingsSchema, response: counterSettingsSchema }),

  // the payments provider's webhook: a raw, signed body
  paymentsWebhook: endpoint({
    method: 'post',
    path: '/webhooks/payments',
    response: z.object({ received: z.literal(true), result: z.enum(['applied', 'duplicate']) }),
  }),
} as const satisfies Record<string, Endpoint>;

export type Api = typeof api;
export type EndpointName = keyof Api;

/** A path with its `:params` filled in and encoded: pathFor(api.getOrder, { id }) → "/api/orders/…". */
export function pathFor<E extends Endpoint>(e: E, params: ParamsOf<E>): string {
  return e.path.replace(/:([A-Za-z]+)/g, (_, name: string) => {
    const value = (params as Record<string, unknown>)[name];
    if (value === undefined) throw new Error(`pathFor(${e.path}): missing ${name}`);
    return encodeURIComponent(String(value));
  });
}
