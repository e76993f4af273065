import { useShop } from '@fryline/ui';

/** Sets the browser tab's title, with the business's name (React hoists <title> into the document head). */
export function PageTitle({ children }: { children: string }) {
  const shop = useShop();
  return <title>{shop ? `${children} · ${shop.name}` : children}</title>;
}
