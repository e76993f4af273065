import { forwardRef, useEffect, useState } from 'react';

/** A local URL showing a chosen file before it is sent (freed when the file changes or the screen goes), or null. */
export function usePreviewUrl(file: File | null): string | null {
  const [url, setUrl] = useState<string | null>(null);
  useEffect(() => {
    if (!file) {
      setUrl(null);
      return;
    }
    const made = URL.createObjectURL(file);
    setUrl(made);
    return () => URL.revokeObjectURL(made);
  }, [file]);
  return url;
}

interface ImageFileInputProps {
  id: string;
  label: string;
  describedBy: string;
  invalid?: boolean;
  disabled?: boolean;
  onFile: (file: File | null) => void;
}

/** A labelled file field that offers the image types the server takes (JPEG, PNG, WebP). */
export const ImageFileInput = forwardRef<HTMLInputElement, ImageFileInputProps>(function ImageFileInput({ id, label, describedBy, invalid, disabled, onFile }, ref) {
  return (
    <>
      <label htmlFor={id} className="font-semibold">
        {label}
      </label>
      <input
        ref={ref}
        id={id}
        type="file"
        accept="image/jpeg,image/png,image/webp"
        aria-describedby={describedBy}
        aria-invalid={invalid ? true : undefined}
        className="max-w-full text-sm"
        disabled={disabled}
        onChange={(event) => onFile(event.target.files?.[0] ?? null)}
      />
    </>
  );
});
