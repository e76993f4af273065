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

export const plannedPages: Record<string, PlannedPage> = {};
