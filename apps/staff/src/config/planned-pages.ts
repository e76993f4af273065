/**
 * What each section not built yet will hold, shown on its page until the
 * work that brings it arrives. A section leaves this list when it gets a
 * real page in its own feature folder.
 */
export interface PlannedPage {
  intro: string;
  arrivesWith: string;
  will: readonly string[];
}

export const plannedPages: Record<string, PlannedPage> = {
  pickups: {
    intro: "The day's pickup list: find each order in seconds, check it off, and sell what is left to walk-ups.",
    arrivesWith: 'the counter work',
    will: [
      'Every order for the bake day, grouped by pickup window',
      'Find an order by name or pickup code, or scan its QR code',
      'Mark an order collected, with undo, or as a no-show',
      'Sell the surplus to walk-ups',
      'Keep working through a patchy connection and catch up when it is back',
    ],
  },
};
