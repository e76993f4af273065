import { MENU_PHOTO_MAX_BYTES, type MenuPhotoView } from '@fryline/schemas';
import { ApiError, api } from '@fryline/ui/api-client';

/**
 * Sends one image as multipart/form-data in `field` to `path` (a menu
 * item's photo, the shop's logo). The shared client speaks JSON only, so
 * this one kind of request is made here, with the same CSRF token and the
 * same error type. `what` names the image in the messages.
 */
export async function uploadImage(path: string, field: string, file: File, what = 'photo'): Promise<MenuPhotoView> {
  const { token } = await api.get<{ token: string }>('/api/csrf');
  const body = new FormData();
  body.append(field, file, file.name);
  let res: Response;
  try {
    res = await fetch(path, {
      method: 'POST',
      body,
      credentials: 'same-origin',
      headers: { Accept: 'application/json', 'X-CSRF-Token': token },
    });
  } catch {
    throw new ApiError({ status: 0, code: 'network', message: `The ${what} did not reach Fryline. Check your connection and try again.` });
  }
  const parsed = (await res.json().catch(() => null)) as { error?: { code: string; message: string; details?: unknown } } | MenuPhotoView | null;
  if (!res.ok) {
    const error = parsed && 'error' in parsed ? parsed.error : undefined;
    throw new ApiError({ status: res.status, code: error?.code ?? `http_${res.status}`, message: error?.message ?? `The ${what} was not accepted (HTTP ${res.status}).`, details: error?.details });
  }
  return parsed as MenuPhotoView;
}

const IMAGE_TYPES = ['image/jpeg', 'image/png', 'image/webp'];

/** A first check in the browser, so a wrong file is named before it is sent; the server checks the content again. */
export function imageProblem(file: File, what: string): string | null {
  if (file.size > MENU_PHOTO_MAX_BYTES) {
    return `This ${what} is ${(file.size / 1024 / 1024).toFixed(1)} MB; the limit is ${MENU_PHOTO_MAX_BYTES / 1024 / 1024} MB. Choose a smaller one.`;
  }
  if (file.type && !IMAGE_TYPES.includes(file.type)) return `Choose a JPEG, PNG or WebP ${what}.`;
  return null;
}
