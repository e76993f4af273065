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
  menu: {
    intro: 'What customers can put in a box, and what it costs.',
    arrivesWith: "the owner's setup work",
    will: [
      'Flavour and glaze combinations, for rings and for holes',
      'The allergens of each item, shown to customers before they pay',
      'Box sizes, their prices and any extra charge per item',
    ],
  },
};
