import { useId, useRef, useState } from 'react';
import { MenuPhoto, useShop } from '@fryline/ui';
import { errorMessage } from '@fryline/ui/api-client';
import { imageProblem } from '../../../lib/upload-image';
import { ImageFileInput, usePreviewUrl } from '../../../lib/image-file';
import { useShopLogo } from '../api/use-shop-logo';

/**
 * The business's logo: choose one (checked here for type and size, and by
 * the server by its content), see it as the shop's header will show it
 * before sending it, put it up, or take it down.
 */
export function LogoPanel({ shopName }: { shopName: string }) {
  const id = useId();
  const input = useRef<HTMLInputElement>(null);
  const shop = useShop();
  const { upload, remove } = useShopLogo();
  const [chosen, setChosen] = useState<File | null>(null);
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const current = shop?.logo ?? null;
  const busy = upload.isPending || remove.isPending;

  const preview = usePreviewUrl(chosen);

  const clear = () => {
    setChosen(null);
    if (input.current) input.current.value = '';
  };

  return (
    <section className="card flex flex-col gap-3" aria-labelledby={`${id}-heading`}>
      <h2 id={`${id}-heading`} className="text-xl">
        Logo
      </h2>
      <p className="text-muted">Shown beside the shop's name in its header and at the top of every e-mail. Without one, the name stands alone.</p>
      <div className="flex flex-col items-start gap-4 sm:flex-row">
        <figure className="flex min-h-20 w-full min-w-0 flex-wrap items-center gap-3 rounded-xl border border-line bg-paper px-3 py-2 sm:w-auto sm:max-w-sm">
          {preview ? (
            <img src={preview} alt={`The new logo for ${shopName}`} className="h-10 w-auto max-w-48 object-contain" />
          ) : current ? (
            <MenuPhoto photo={current} alt={`The logo of ${shopName}`} sizes="120px" className="h-10 w-auto max-w-48 bg-transparent object-contain" />
          ) : (
            <span className="text-sm text-muted">No logo</span>
          )}
          <figcaption className="text-lg font-extrabold text-plum-800">{shopName}</figcaption>
        </figure>
        <div className="flex w-full min-w-0 flex-1 flex-col gap-2">
          <ImageFileInput
            ref={input}
            id={id}
            label={current ? 'Choose another logo' : 'Choose a logo'}
            describedBy={`${id}-help`}
            disabled={busy}
            onFile={(file) => {
              const problem = file ? imageProblem(file, 'logo') : null;
              setMessage(problem ? { ok: false, text: problem } : null);
              setChosen(problem ? null : file);
            }}
          />
          <p id={`${id}-help`} className="text-sm text-muted">
            JPEG, PNG or WebP, up to 8 MB; a wide logo on a clear or light background reads best. We keep small copies and leave out
            the camera details and location stored in the file.
          </p>
          <div className="flex flex-wrap gap-2">
            {chosen && (
              <>
                <button
                  type="button"
                  className="btn btn-primary btn-small"
                  disabled={busy}
                  onClick={() =>
                    upload.mutate(chosen, {
                      onSuccess: () => {
                        clear();
                        setMessage({ ok: true, text: 'The new logo is up.' });
                      },
                      onError: (error) => setMessage({ ok: false, text: errorMessage(error) }),
                    })
                  }
                >
                  {upload.isPending && <span className="spinner" aria-hidden="true" />}
                  Put this logo up
                </button>
                <button type="button" className="btn btn-quiet btn-small" disabled={busy} onClick={clear}>
                  Don't use this one
                </button>
              </>
            )}
            {current && !chosen && (
              <button
                type="button"
                className="btn btn-quiet btn-small"
                disabled={busy}
                onClick={() =>
                  remove.mutate(undefined, {
                    onSuccess: () => setMessage({ ok: true, text: 'The logo is taken down; the header shows the name alone.' }),
                    onError: (error) => setMessage({ ok: false, text: errorMessage(error) }),
                  })
                }
              >
                Take the logo down
              </button>
            )}
          </div>
          {message && (
            <p role={message.ok ? 'status' : 'alert'} className={`notice ${message.ok ? 'notice-ok' : 'notice-bad'}`}>
              {message.text}
            </p>
          )}
        </div>
      </div>
    </section>
  );
}
