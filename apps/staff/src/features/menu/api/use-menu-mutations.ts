import { useMutation, useQueryClient } from '@tanstack/react-query';
import { MENU_PHOTO_FIELD, type MenuItemAdminView, type MenuItemInput, type MenuItemPatch } from '@fryline/schemas';
import { api, errorMessage } from '@fryline/ui/api-client';
import { queryRoots } from '../../../lib/query-keys';
import { menuRoot } from './menu-queries';
import { uploadImage } from '../../../lib/upload-image';

const itemPath = (id: string) => `/api/staff/menu-items/${encodeURIComponent(id)}`;

/** After any menu change: the menu lists, and the bake days that show the menu. */
function useRefresh() {
  const queryClient = useQueryClient();
  return () => Promise.all([queryClient.invalidateQueries({ queryKey: menuRoot }), queryClient.invalidateQueries({ queryKey: queryRoots.bakeDays })]);
}

export interface SaveMenuItem {
  /** Absent for a new item. */
  id?: string;
  body: MenuItemInput | MenuItemPatch;
  /** A photo to upload once the item is saved. */
  photo?: File | null;
  removePhoto?: boolean;
}

export interface SavedMenuItem {
  item: MenuItemAdminView;
  /** Why the photo was not taken, when the item was saved but its photo was refused. */
  photoError?: string;
}

/**
 * Creates or edits an item, then uploads or removes its photo. The item is
 * saved first, so a refused photo leaves a saved item and says why.
 */
export function useSaveMenuItem() {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: async ({ id, body, photo, removePhoto }: SaveMenuItem): Promise<SavedMenuItem> => {
      const saved = id
        ? Object.keys(body).length > 0
          ? await api.patch<MenuItemAdminView>(itemPath(id), body)
          : await api.get<MenuItemAdminView>(itemPath(id))
        : await api.post<MenuItemAdminView>('/api/staff/menu-items', body);
      if (photo) {
        try {
          return { item: { ...saved, photo: await uploadImage(`${itemPath(saved.id)}/photo`, MENU_PHOTO_FIELD, photo) } };
        } catch (error) {
          return { item: saved, photoError: errorMessage(error) };
        }
      }
      if (removePhoto && saved.photo) {
        await api.delete(`${itemPath(saved.id)}/photo`);
        return { item: { ...saved, photo: null } };
      }
      return { item: saved };
    },
    onSettled: refresh,
  });
}

/** Archives an item (off the menu, kept for past orders) or brings it back. */
export function useArchiveMenuItem() {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: ({ id, archived }: { id: string; archived: boolean }) =>
      api.post<MenuItemAdminView>(`${itemPath(id)}/${archived ? 'archive' : 'restore'}`),
    onSuccess: refresh,
  });
}
