/**
 * The first element of every query key, one per resource. Feature query
 * factories build their keys on these, and a mutation in one feature can
 * invalidate another resource's data without importing that feature.
 */
export const queryRoots = {
  me: ['me'],
  shop: ['shop'],
  bakeDays: ['bake-days'],
  orders: ['orders'],
  waitlist: ['waitlist'],
} as const;
