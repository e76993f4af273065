import { useState } from 'react';
import type { BakeDayEditView } from '@fryline/schemas';
import { FieldShell } from '@fryline/ui';
import { SectionForm } from './section-form';

export function PlaceForm({ day }: { day: BakeDayEditView }) {
  const [place, setPlace] = useState(day.place);
  const [address, setAddress] = useState(day.address);
  return (
    <SectionForm
      bakeDayId={day.id}
      title="Place"
      intro="Where customers collect. Everyone with a paid order is e-mailed when it changes."
      build={() => (place.trim().length < 2 ? 'Name the place.' : { place: place.trim(), address: address.trim() })}
    >
      <div className="grid gap-3 sm:grid-cols-2">
        <FieldShell id="edit-place" label="Place">
          <input id="edit-place" className="field-input" value={place} onChange={(e) => setPlace(e.target.value)} maxLength={120} />
        </FieldShell>
        <FieldShell id="edit-address" label="Address" optional>
          <input id="edit-address" className="field-input" value={address} onChange={(e) => setAddress(e.target.value)} maxLength={200} />
        </FieldShell>
      </div>
    </SectionForm>
  );
}
