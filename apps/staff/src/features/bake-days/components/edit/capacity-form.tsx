import { useState } from 'react';
import type { BakeDayEditView } from '@fryline/schemas';
import { FieldShell } from '@fryline/ui';
import { formatPieces } from '@fryline/ui/format';
import { SectionForm, useServerReset } from './section-form';

/** Rings and holes on offer; never below what is sold or on hold (the server refuses with both numbers). */
export function CapacityForm({ day }: { day: BakeDayEditView }) {
  const [rings, setRings] = useState(String(day.capacity.rings));
  const [holes, setHoles] = useState(String(day.capacity.holes));
  const [above, setAbove] = useState(false);
  useServerReset(day.capacity, () => {
    setRings(String(day.capacity.rings));
    setHoles(String(day.capacity.holes));
  });
  const build = () => {
    if (!/^\d+$/.test(rings.trim()) || !/^\d+$/.test(holes.trim())) return 'Capacity is a whole number of rings and of holes.';
    return { ringCapacity: Number(rings), holeCapacity: Number(holes), acceptAboveEquipment: above };
  };
  return (
    <SectionForm
      bakeDayId={day.id}
      title="Capacity"
      intro={`Sold or on hold so far: ${formatPieces(day.sold.rings, day.sold.holes)}. More capacity goes to the waitlist first.`}
      build={build}
    >
      <div className="grid gap-3 sm:grid-cols-2">
        <FieldShell id="edit-rings" label="Rings" help={`At least ${day.sold.rings}`}>
          <input id="edit-rings" inputMode="numeric" className="field-input" value={rings} onChange={(e) => setRings(e.target.value)} />
        </FieldShell>
        <FieldShell id="edit-holes" label="Holes" help={`At least ${day.sold.holes}`}>
          <input id="edit-holes" inputMode="numeric" className="field-input" value={holes} onChange={(e) => setHoles(e.target.value)} />
        </FieldShell>
      </div>
      <label className="flex items-center gap-2">
        <input type="checkbox" checked={above} onChange={(e) => setAbove(e.target.checked)} />
        Allow more than the equipment settings say a day can make
      </label>
    </SectionForm>
  );
}
