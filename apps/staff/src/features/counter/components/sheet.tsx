import { useEffect, useId, useRef, type ReactNode } from 'react';

/**
 * A modal panel on the browser's own <dialog>, sized for a phone held in one
 * hand: it sits at the bottom of the screen, within thumb reach. Mount it to
 * open it, unmount it to close it; Escape closes it too.
 */
export function Sheet({ title, onClose, children }: { title: string; onClose: () => void; children: ReactNode }) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  useEffect(() => {
    const dialog = ref.current;
    if (dialog && !dialog.open) dialog.showModal();
    return () => dialog?.close();
  }, []);
  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onClose={() => {
        if (!ref.current?.open) onClose();
      }}
      className="mx-auto mt-auto mb-0 max-h-[90dvh] w-full max-w-lg overflow-y-auto rounded-t-3xl border border-line bg-paper p-5 text-ink shadow-xl backdrop:bg-ink/50 sm:mb-auto sm:rounded-3xl"
    >
      <h2 id={titleId} className="text-xl">
        {title}
      </h2>
      <div className="mt-3 flex flex-col gap-3">{children}</div>
    </dialog>
  );
}
