/** Settings of the shop that are ours to choose, in one place. */
export const site = {
  /** How often the order page asks whether a payment has been confirmed. */
  paymentPollMs: 1000,
  /** How long the order page waits for that confirmation before saying so. */
  paymentConfirmTimeoutMs: 60_000,
  /** Where a half-built box is kept while the customer signs in. */
  draftStorageKey: 'fryline.box-draft.v1',
} as const;

/** Every doughnut on the menu contains these, whatever its glaze. */
export const baseAllergens = ['wheat', 'milk', 'eggs'] as const;
