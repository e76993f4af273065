import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api as contract, SHOP_LOGO_FIELD, type ShopLogoView } from '@fryline/schemas';
import { shopQueryRoot } from '@fryline/ui';
import { api } from '@fryline/ui/api-client';
import { uploadImage } from '../../../lib/upload-image';

/** Puts up a new logo (`POST /api/staff/shop-settings/logo`, multipart) or takes it down; the shop's header reads it again. */
export function useShopLogo() {
  const queryClient = useQueryClient();
  const refresh = () => queryClient.invalidateQueries({ queryKey: shopQueryRoot });
  const upload = useMutation({
    mutationFn: (file: File) => uploadImage(contract.uploadShopLogo.path, SHOP_LOGO_FIELD, file, 'logo') as Promise<ShopLogoView>,
    onSuccess: refresh,
  });
  const remove = useMutation({ mutationFn: () => api.delete(contract.removeShopLogo.path), onSuccess: refresh });
  return { upload, remove };
}
