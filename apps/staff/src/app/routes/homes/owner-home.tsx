import { PageFrame } from '../../../components/page-frame';
import { Caution } from '@fryline/ui';
import { CapacityTable } from '../../../features/bake-days/components/capacity-table';
import { SectionLinks } from './section-links';

export function OwnerHome() {
  return (
    <PageFrame title="Owner — overview" intro="Upcoming bake days, how full they are, and everything you set up.">
      <CapacityTable caption="Upcoming bake days and what is left" />
      <SectionLinks
        label="Owner pages"
        paths={['bake-days', 'menu', 'equipment', 'staff', 'sales', 'production', 'formula', 'pickups']}
      />
      <Caution title="Selling home-made food">
        <p>
          The rules for selling food made at home differ from place to place, and can change. Check the rules where you
          sell (permits, labelling, allergens, where you may trade) before each season. Fryline does not check this for
          you.
        </p>
      </Caution>
    </PageFrame>
  );
}
