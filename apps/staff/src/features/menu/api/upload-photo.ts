import { MENU_PHOTO_FIELD, type MenuPhotoView } from '@fryline/schemas';
import { ApiError, api } from '@fryline/ui/api-client';

/**
 * Sends a photo as multipart/form-data (`POST /api/staff/menu-items/:id/photo`).
 * The shared client speaks JSON only, so this one request is made here, with
 * the same CSRF token and the same error type.
 */
export async function uploadMenuPhoto(itemId: string, file: File): Promise<MenuPhotoView> {
  const { token } = await api.get<{ token: string }>('/api/csrf');
  const body = new FormData();
  body.append(MENU_PHOTO_FIELD, file, file.name);
  let res: Response;
  try {
    res = await fetch(`/api/staff/menu-items/${encodeURIComponent(itemId)}/photo`, {
      method: 'POST',
      body,
      credentials: 'same-origin',
      headers: { Accept: 'application/json', 'X-CSRF-Token': token },
    });
  } catch {
    throw new ApiError({ status: 0, code: 'network', message: 'The photo did not reach Fryline. Check your connection and try again.' });
  }
  const parsed = (await res.json().catch(() => null)) as { error?: { code: string; message: string; details?: unknown } } | MenuPhotoView | null;
  if (!res.ok) {
    const error = parsed && 'error' in parsed ? parsed.error : undefined;
    throw new ApiError({ status: res.status, code: error?.code ?? `http_${res.status}`, message: error?.message ?? `The photo was not accepted (HTTP ${res.status}).`, details: error?.details });
  }
  return parsed as MenuPhotoView;
}
