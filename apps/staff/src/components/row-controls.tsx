/** The "Remove" button at the end of an editable table row. */
export function RemoveRowButton({ label, disabled, onRemove }: { label: string; disabled?: boolean; onRemove: () => void }) {
  return (
    <button type="button" className="btn btn-quiet btn-small" aria-label={label} disabled={disabled} onClick={onRemove}>
      Remove
    </button>
  );
}

/** An error about a whole list of rows (too few, too many, a total off). */
export function ListError({ message }: { message?: string }) {
  if (!message) return null;
  return (
    <p role="alert" className="field-error">
      {message}
    </p>
  );
}
