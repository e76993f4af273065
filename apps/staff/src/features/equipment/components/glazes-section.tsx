import { useState } from 'react';
import { useFieldArray, useWatch } from 'react-hook-form';
import { glazeIdFrom, MAX_GLAZES, newGlaze } from '../model/glazes';
import { fieldError, type SettingsForm } from './settings-field';
import { GlazeCard } from './glaze-card';

/**
 * The glaze recipes the production sheet makes glaze from. Menu items link
 * to a recipe by its id, which is made from the name when the recipe is
 * added and kept when it is renamed.
 */
export function GlazesSection({ form, savedIds }: { form: SettingsForm; savedIds: ReadonlySet<string> }) {
  const list = useFieldArray({ control: form.control, name: 'glazes', keyName: 'key' });
  const glazes = useWatch({ control: form.control, name: 'glazes' }) ?? [];
  const [removed, setRemoved] = useState<string | null>(null);
  const listError = form.formState.errors.glazes?.root?.message ?? fieldError(form, 'glazes');
  /** Ids no new glaze may take: those on the page and those saved (menu items may still point at them). */
  const takenIds = (except?: string) => [...glazes.map((g) => g.id), ...savedIds].filter((id) => id !== except);

  return (
    <fieldset className="card flex flex-col gap-3" aria-describedby="glazes-intro">
      <legend className="float-left w-full text-xl font-extrabold">Glazes</legend>
      <p id="glazes-intro" className="max-w-prose text-muted">
        Each recipe’s amount per piece and its parts by weight. The production sheet makes enough of each for the pieces
        ordered with it, plus the extra for the bowl.
      </p>
      {list.fields.length === 0 && <p className="text-muted">No glazes: every piece is planned plain.</p>}
      <ol className="flex flex-col gap-3">
        {list.fields.map((field, index) => (
          <li key={field.key}>
            <GlazeCard
              form={form}
              index={index}
              isNew={!savedIds.has(glazes[index]?.id ?? field.id)}
              onRename={(name) => {
                const id = glazes[index]?.id ?? field.id;
                if (!savedIds.has(id)) form.setValue(`glazes.${index}.id`, glazeIdFrom(name, takenIds(id)));
              }}
              onRemove={() => {
                const glaze = glazes[index];
                if (glaze && form.getValues('spare.glazeId') === glaze.id) {
                  form.setValue('spare.glazeId', null, { shouldDirty: true });
                }
                setRemoved(glaze?.name.trim() || 'The new glaze');
                list.remove(index);
              }}
            />
          </li>
        ))}
      </ol>
      {removed && form.formState.isDirty && (
        <p role="status" className="notice">
          {removed} is off the list. It goes when you save the settings; “Undo changes” brings it back.
        </p>
      )}
      {listError && (
        <p role="alert" className="field-error">
          {listError}
        </p>
      )}
      <AddGlaze
        full={list.fields.length >= MAX_GLAZES}
        names={glazes.map((g) => g.name.trim().toLowerCase())}
        onAdd={(name) => {
          setRemoved(null);
          list.append(newGlaze(name, takenIds()), { focusName: `glazes.${list.fields.length}.parts.0.name` });
        }}
      />
    </fieldset>
  );
}

/** A name and a button: not a form of its own, since it sits inside the settings form. */
function AddGlaze({ full, names, onAdd }: { full: boolean; names: string[]; onAdd: (name: string) => void }) {
  const [name, setName] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const add = () => {
    const trimmed = name.trim();
    if (trimmed === '') return setProblem('Name the new glaze first.');
    if (names.includes(trimmed.toLowerCase())) return setProblem(`There is already a glaze called “${trimmed}”.`);
    setProblem(null);
    setName('');
    onAdd(trimmed);
  };
  return (
    <div className="flex flex-col gap-1 border-t border-line pt-3">
      <label htmlFor="new-glaze-name" className="field-label">
        New glaze
      </label>
      <div className="flex flex-wrap gap-2">
        <input
          id="new-glaze-name"
          type="text"
          autoComplete="off"
          className="field-input max-w-xs"
          placeholder="Its name"
          value={name}
          disabled={full}
          aria-invalid={problem ? true : undefined}
          aria-describedby={problem ? 'new-glaze-error' : full ? 'new-glaze-full' : undefined}
          onChange={(event) => setName(event.target.value)}
          onKeyDown={(event) => {
            if (event.key !== 'Enter') return;
            event.preventDefault(); // Enter here adds the glaze rather than saving the page
            add();
          }}
        />
        <button type="button" className="btn btn-quiet" disabled={full} onClick={add}>
          Add glaze
        </button>
      </div>
      {full && (
        <p id="new-glaze-full" className="text-sm text-muted">
          That is the most glazes the settings hold ({MAX_GLAZES}); remove one to add another.
        </p>
      )}
      {problem && (
        <p id="new-glaze-error" className="field-error">
          {problem}
        </p>
      )}
    </div>
  );
}
