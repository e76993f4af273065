import { useStaffMember } from '../session/staff-member';
import { CounterHome } from './homes/counter-home';
import { BakerHome } from './homes/baker-home';
import { OwnerHome } from './homes/owner-home';

/** Each role lands on a page about its own job. */
export function HomeRoute() {
  const { role } = useStaffMember();
  if (role === 'owner') return <OwnerHome />;
  if (role === 'baker') return <BakerHome />;
  return <CounterHome />;
}
