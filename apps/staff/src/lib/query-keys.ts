/** The first element of every query key, one per resource. */
export const queryRoots = {
  me: ['me'],
  bakeDays: ['bake-days'],
} as const;
