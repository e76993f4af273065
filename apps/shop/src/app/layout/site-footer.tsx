import { useShop } from '@fryline/ui';
import { listWords } from '@fryline/ui/format';
import { baseAllergens } from '../../config/site';

export function SiteFooter() {
  const shop = useShop();
  return (
    <footer className="mt-12 border-t border-line bg-crumb">
      <div className="mx-auto flex max-w-5xl flex-col gap-2 px-4 py-6 text-sm">
        <p>
          <span className="font-extrabold">{shop?.name ?? 'We'}</span> {shop ? 'is' : 'are'} a small weekend doughnut pop-up. Our doughnuts are made
          in a home-scale kitchen, not a commercial bakery, and every one contains {listWords(baseAllergens)}.
        </p>
        <p className="text-muted">
          The rules for selling food made at home are different from one place to the next. Checking and following the
          rules where we sell is our own job as the people running this pop-up; this site does not vouch for it.
        </p>
        <p className="text-xs text-muted">Orders and pickup run on Fryline.</p>
      </div>
    </footer>
  );
}
