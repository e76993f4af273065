import { useEffect, useReducer, useRef, useState, type ReactNode } from 'react';
import { useMoney } from '@fryline/ui';
import { boxTakes, type BakeDayView } from '@fryline/schemas';
import {
  boxTitle,
  canAddBox,
  draftProblems,
  offeredBoxes,
  piecesUsed,
  previewPrice,
  reduceDraft,
  type Draft,
  type DraftAction,
  type PieceLimits,
} from '../model/draft';
import { loadDraft, saveDraft } from '../model/draft-storage';
import { plural } from '@fryline/ui/format';
import { PickupWindowOptions } from '../../../components/pickup-window-options';
import { BoxEditor } from './box-editor';
import { OrderReview } from './order-review';

interface BoxBuilderProps {
  day: BakeDayView;
  /** Keeps drafts apart in storage: one per bake day, one per waitlist offer. */
  scope: string;
  /** How much may be ordered; the bake day's remaining capacity unless an offer says otherwise. */
  limits?: PieceLimits;
  claimToken?: string;
  signedIn: boolean | undefined;
  /** Shown when the customer already has an unpaid order on hold. */
  renderHoldExists?: (orderId: string, onResolved: () => void) => ReactNode;
}

/** Choose a pickup window, fill one or more boxes, review, pay. */
/** Why a box size can't be added, in words (the button stays readable and says so). */
function unavailableReason(kind: 'ring' | 'hole', limits: PieceLimits, used: PieceLimits, claim: boolean): string {
  const limit = kind === 'ring' ? limits.rings : limits.holes;
  const left = limit - (kind === 'ring' ? used.rings : used.holes);
  if (claim) return limit <= 0 ? `Your offer has no ${kind}s` : `Only ${plural(Math.max(0, left), kind)} left in your offer`;
  if (limit <= 0) return `${kind === 'ring' ? 'Rings' : 'Holes'} sold out`;
  return left <= 0 ? `Your boxes use every ${kind} left` : `Only ${plural(left, kind)} left`;
}

export function BoxBuilder({ day, scope, limits = day.remaining, claimToken, signedIn, renderHoldExists }: BoxBuilderProps) {
  const money = useMoney();
  const [draft, dispatch] = useReducer(
    (state: Draft, action: DraftAction) => reduceDraft(day, state, action),
    undefined,
    (): Draft => {
      // A draft read back from storage may no longer fit (a window filled up): back to building then.
      const stored = loadDraft(scope, day);
      return stored.step === 'review' && draftProblems(day, stored, limits).length > 0 ? { ...stored, step: 'build' } : stored;
    },
  );
  const [showProblems, setShowProblems] = useState(false);
  const problemsRef = useRef<HTMLDivElement>(null);
  const lastBoxCount = useRef(draft.boxes.length);
  const firstRender = useRef(true);

  useEffect(() => saveDraft(scope, draft), [scope, draft]);

  // Move focus to a newly added box, and to the top of each step.
  useEffect(() => {
    if (draft.boxes.length > lastBoxCount.current) {
      const added = draft.boxes[draft.boxes.length - 1];
      if (added) document.getElementById(`box-${added.key}`)?.focus();
    }
    lastBoxCount.current = draft.boxes.length;
  }, [draft.boxes]);
  useEffect(() => {
    if (firstRender.current) {
      firstRender.current = false;
      if (draft.step === 'build') return;
    }
    document.getElementById(draft.step === 'review' ? 'review-heading' : 'build-heading')?.focus();
  }, [draft.step]);

  if (draft.step === 'review') {
    return (
      <OrderReview
        day={day}
        draft={draft}
        scope={scope}
        claimToken={claimToken}
        signedIn={signedIn}
        onBack={() => dispatch({ type: 'setStep', step: 'build' })}
        renderHoldExists={renderHoldExists}
      />
    );
  }

  const price = previewPrice(day, draft);
  const problems = draftProblems(day, draft, limits);
  const used = piecesUsed(day, draft);
  const offered = offeredBoxes(day);

  const review = () => {
    if (problems.length > 0) {
      setShowProblems(true);
      problemsRef.current?.focus();
      return;
    }
    dispatch({ type: 'setStep', step: 'review' });
  };

  return (
    <section aria-labelledby="build-heading" className="flex flex-col gap-6">
      <h2 id="build-heading" tabIndex={-1} className="sr-only">
        Build your order
      </h2>

      <div className="card">
        <PickupWindowOptions
          legend="1. Choose a pickup window"
          name="pickup-window"
          windows={day.pickupWindows}
          timeZone={day.timeZone}
          value={draft.pickupWindowId}
          onChange={(windowId) => dispatch({ type: 'chooseWindow', windowId })}
        />
      </div>

      <div className="flex flex-col gap-4">
        <h2 className="text-lg">2. Fill your boxes</h2>
        {draft.boxes.map((box, index) => (
          <BoxEditor
            key={box.key}
            day={day}
            box={box}
            title={boxTitle(day, draft, box)}
            priceCents={price.boxesCents[index] ?? 0}
            dispatch={dispatch}
          />
        ))}
        <div role="group" aria-labelledby="add-box-label" className="flex flex-col gap-2">
          <p id="add-box-label" className="font-extrabold">
            {draft.boxes.length === 0 ? 'Start with a box:' : 'Add another box:'}
          </p>
          <div className="grid gap-2 sm:grid-cols-3">
            {offered.map((box) => {
              const fits = canAddBox(day, draft, box.size, limits);
              const kind = boxTakes(box.size);
              return (
                <button
                  key={box.size}
                  type="button"
                  className="btn btn-accent flex-col gap-0 rounded-2xl py-2"
                  disabled={!fits}
                  onClick={() => dispatch({ type: 'addBox', size: box.size })}
                >
                  <span>{box.label}</span>
                  <span className="text-sm font-semibold">
                    {fits ? `${plural(box.pieces, kind)} · from ${money(box.priceCents)}` : unavailableReason(kind, limits, used, Boolean(claimToken))}
                  </span>
                </button>
              );
            })}
          </div>
          <p className="text-sm text-muted">
            Left to order: {plural(Math.max(0, limits.rings - used.rings), 'ring')}
            {day.capacity.holes > 0 && `, ${plural(Math.max(0, limits.holes - used.holes), 'hole')}`}.
          </p>
        </div>
      </div>

      <div className="sticky bottom-0 z-10 -mx-4 border-t border-line bg-paper px-4 py-3 shadow-[0_-6px_16px_-12px_rgb(43_24_48/0.35)] sm:mx-0 sm:rounded-2xl sm:border">
        <div className="flex items-center justify-between gap-3">
          <p aria-live="polite">
            <span className="block text-xl font-extrabold">{money(price.totalCents)}</span>
            <span className="text-sm text-muted">
              {plural(draft.boxes.length, 'box', 'boxes')}
              {price.taxCents > 0 && day.tax.mode === 'added' && ' · tax included'}
            </span>
          </p>
          <button type="button" className="btn btn-primary" onClick={review}>
            Review order
          </button>
        </div>
        <div ref={problemsRef} tabIndex={-1} aria-live="polite">
          {showProblems && problems.length > 0 && (
            <ul className="mt-2 list-inside list-disc text-sm font-semibold text-brick-700">
              {problems.map((problem) => (
                <li key={problem}>{problem}</li>
              ))}
            </ul>
          )}
        </div>
      </div>
    </section>
  );
}
