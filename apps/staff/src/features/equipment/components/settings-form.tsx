import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { productionSettingsSchema, type ProductionSettingsInput, type ProductionSettingsView } from '@fryline/schemas';
import { formatDateTime } from '@fryline/ui/format';
import { UnitSwitch } from '../../../lib/unit-switch';
import { useUnits } from '../../../lib/use-units';
import type { Capacity } from '@fryline/production';
import { useSaveSettings } from '../api/use-save-settings';
import { settingsMessages } from '../model/glazes';
import { limitNames, placeServerErrors, settingsGroups, toSettingsValues } from '../model/settings-fields';
import { GlazesSection } from './glazes-section';
import { PricesSection } from './prices-section';
import { SettingsField } from './settings-field';

const glazeIds = (settings: ProductionSettingsInput) => new Set(settings.glazes.map((glaze) => glaze.id));

/** The kitchen's settings; saving works out the capacity again. */
export function SettingsForm({
  settings,
  capacity,
}: {
  settings: ProductionSettingsView;
  /** The capacity worked out from the saved settings; undefined while it is being worked out. */
  capacity: Capacity | undefined;
}) {
  const save = useSaveSettings();
  const [{ temp }] = useUnits();
  const [problems, setProblems] = useState<string[]>([]);
  const [saved, setSaved] = useState(false);
  const form = useForm<ProductionSettingsInput>({
    resolver: zodResolver(productionSettingsSchema, { error: settingsMessages }),
    defaultValues: toSettingsValues(settings),
  });

  /** Glazes the API holds; a new one's id follows its name until it is saved. */
  const [savedGlazeIds, setSavedGlazeIds] = useState(() => glazeIds(settings));

  const submit = form.handleSubmit(
    (values) => {
      setProblems([]);
      setSaved(false);
      save.mutate(values, {
        onSuccess: (stored) => {
          form.reset(toSettingsValues(stored));
          setSavedGlazeIds(glazeIds(stored));
          setSaved(true);
        },
        onError: (error) => setProblems(placeServerErrors(error, values, form.setError)),
      });
    },
    () => setProblems(['Some settings need another look: see the messages beside them.']),
  );

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4" aria-label="Equipment settings">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <p className="text-sm text-muted">
          {settings.updatedAt
            ? `Last saved ${formatDateTime(settings.updatedAt, Intl.DateTimeFormat().resolvedOptions().timeZone)}.`
            : 'Not saved yet: these are the starting values.'}
        </p>
        <UnitSwitch show={['temp']} />
      </div>
      {settingsGroups.map((group) => (
        <fieldset key={group.id} className="card flex flex-col gap-3">
          <legend className="float-left w-full text-xl font-extrabold">{group.title}</legend>
          {group.intro && <p className="text-muted">{group.intro}</p>}
          <div className="grid gap-x-4 gap-y-3 sm:grid-cols-2">
            {group.fields.map((field) => (
              <SettingsField key={field.name} form={form} field={field} tempUnit={temp} />
            ))}
          </div>
        </fieldset>
      ))}
      <GlazesSection form={form} savedIds={savedGlazeIds} />
      <PricesSection form={form} />
      {problems.length > 0 && (
        <div role="alert" className="notice notice-bad">
          {problems.map((problem) => (
            <p key={problem}>{problem}</p>
          ))}
        </div>
      )}
      {saved && !form.formState.isDirty && (
        <p role="status" className="notice notice-ok">
          Saved.{' '}
          {capacity
            ? `With these settings the equipment makes about ${capacity.pieces} rings a bake day, limited by ${limitNames[capacity.limitedBy].toLowerCase()}.`
            : 'Working out the capacity again…'}
        </p>
      )}
      <div className="flex flex-wrap items-center gap-3">
        <button type="submit" className="btn btn-primary" disabled={save.isPending}>
          {save.isPending && <span className="spinner" aria-hidden="true" />}
          Save settings
        </button>
        <button
          type="button"
          className="btn btn-quiet"
          disabled={save.isPending || !form.formState.isDirty}
          onClick={() => {
            form.reset(toSettingsValues(settings));
            setProblems([]);
          }}
        >
          Undo changes
        </button>
      </div>
    </form>
  );
}
