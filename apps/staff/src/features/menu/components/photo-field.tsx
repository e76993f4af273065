import { useId, useRef } from 'react';
import type { MenuPhotoView } from '@fryline/schemas';
import { MenuPhoto } from '@fryline/ui';
import { photoProblem } from '../model/menu-form';
import { ImageFileInput, usePreviewUrl } from '../../../lib/image-file';

interface PhotoFieldProps {
  current: MenuPhotoView | null | undefined;
  itemName: string;
  chosen: File | null;
  remove: boolean;
  error?: string;
  onChoose: (file: File | null, problem: string | null) => void;
  onRemove: (remove: boolean) => void;
}

/** Choose a photo (checked for size and type before it is sent), see it, or take the current one off. */
export function PhotoField({ current, itemName, chosen, remove, error, onChoose, onRemove }: PhotoFieldProps) {
  const id = useId();
  const input = useRef<HTMLInputElement>(null);
  const preview = usePreviewUrl(chosen);

  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="field-label">Photo<span className="font-semibold text-muted"> · optional</span></legend>
      <div className="flex flex-wrap items-start gap-4">
        <div className="w-40">
          {preview ? (
            <img src={preview} alt={`New photo for ${itemName || 'this item'}`} className="aspect-square w-40 rounded-xl object-cover" />
          ) : current && !remove ? (
            <MenuPhoto photo={current} alt={`Photo of ${itemName}`} sizes="160px" className="aspect-square w-40 rounded-xl" />
          ) : (
            <div className="flex aspect-square w-40 items-center justify-center rounded-xl border-2 border-dashed border-line text-sm text-muted">
              No photo
            </div>
          )}
        </div>
        <div className="flex min-w-0 flex-1 flex-col gap-2">
          <ImageFileInput
            ref={input}
            id={id}
            label={current ? 'Choose another photo' : 'Choose a photo'}
            describedBy={`${id}-help${error ? ` ${id}-error` : ''}`}
            invalid={Boolean(error)}
            onFile={(file) => onChoose(file, file ? photoProblem(file) : null)}
          />
          <p id={`${id}-help`} className="text-sm text-muted">
            JPEG, PNG or WebP, up to 8 MB. We keep a few smaller copies for phones and leave out the camera details and
            location stored in the file.
          </p>
          {error && (
            <p id={`${id}-error`} className="field-error" role="alert">
              {error}
            </p>
          )}
          {chosen && (
            <button
              type="button"
              className="btn btn-quiet btn-small self-start"
              onClick={() => {
                if (input.current) input.current.value = '';
                onChoose(null, null);
              }}
            >
              Don't use this photo
            </button>
          )}
          {current && !chosen && (
            <label className="flex items-center gap-2 text-sm">
              <input type="checkbox" checked={remove} onChange={(e) => onRemove(e.target.checked)} className="size-4 accent-plum-700" />
              Take the current photo off
            </label>
          )}
        </div>
      </div>
    </fieldset>
  );
}
