import { useEffect, useId, useRef, type ReactNode } from 'react';

interface ModalDialogProps {
  title: string;
  /** Read out with the title when the dialog opens. */
  description?: ReactNode;
  /** While true, Escape does not close the dialog (a request is on its way). */
  busy?: boolean;
  onClose: () => void;
  children: ReactNode;
}

/**
 * A modal on the browser's own <dialog>: opens when mounted, keeps focus
 * inside, closes on Escape, and gives focus back to where it was when it
 * closes. Mount it to open it, unmount it to close it.
 */
export function ModalDialog({ title, description, busy = false, onClose, children }: ModalDialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  const descriptionId = useId();

  useEffect(() => {
    const dialog = ref.current;
    if (dialog && !dialog.open) dialog.showModal();
    return () => dialog?.close();
  }, []);

  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      aria-describedby={description ? descriptionId : undefined}
      onCancel={(event) => {
        if (busy) event.preventDefault();
      }}
      onClose={() => {
        // Closed by Escape, not by a remount that opened it again (StrictMode runs effects twice).
        if (!ref.current?.open) onClose();
      }}
      className="m-auto max-h-[calc(100dvh-2rem)] w-[min(30rem,calc(100%-2rem))] overflow-y-auto rounded-3xl border border-line bg-paper p-5 text-ink shadow-xl backdrop:bg-ink/50 sm:p-6"
    >
      <h2 id={titleId} className="text-xl">
        {title}
      </h2>
      {description && (
        <div id={descriptionId} className="mt-2 space-y-1">
          {description}
        </div>
      )}
      {children}
    </dialog>
  );
}
