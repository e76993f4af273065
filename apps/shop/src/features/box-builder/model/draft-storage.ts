import type { BakeDayView } from '@fryline/schemas';
import { site } from '../../../config/site';
import { emptyDraft, sanitizeDraft, type Draft } from './draft';

/**
 * A half-built order survives the trip to Google sign-in and back in
 * sessionStorage (this tab only). Storage can be switched off; then the
 * draft simply lives in memory.
 */
function storageKey(scope: string): string {
  return `${site.draftStorageKey}:${scope}`;
}

export function loadDraft(scope: string, day: BakeDayView): Draft {
  try {
    const text = window.sessionStorage.getItem(storageKey(scope));
    return text ? sanitizeDraft(day, JSON.parse(text)) : emptyDraft;
  } catch {
    return emptyDraft;
  }
}

export function saveDraft(scope: string, draft: Draft): void {
  try {
    window.sessionStorage.setItem(storageKey(scope), JSON.stringify(draft));
  } catch {
    // Storage full or switched off: the draft stays in memory only.
  }
}

export function clearDraft(scope: string): void {
  try {
    window.sessionStorage.removeItem(storageKey(scope));
  } catch {
    // Nothing to clear.
  }
}
