import { useRef } from 'react';
import { useFieldArray, type UseFormReturn } from 'react-hook-form';
import type { CreateBakeDayInput } from '@fryline/schemas';
import { ListError, RemoveRowButton } from '../../../components/row-controls';
import { MAX_WINDOWS, nextWindow, type NewBakeDayValues } from '../model/new-bake-day-form';
import { FieldShell } from '@fryline/ui';

export type NewBakeDayForm = UseFormReturn<NewBakeDayValues, unknown, CreateBakeDayInput>;

/** The day's pickup windows as rows of local start and end times, each with an optional order cap. */
export function PickupWindowsFieldset({ form }: { form: NewBakeDayForm }) {
  const { control, register, formState, getValues } = form;
  const rows = useFieldArray({ control, name: 'windows' });
  const addRef = useRef<HTMLButtonElement>(null);
  const errors = formState.errors.windows;
  const listError = errors?.root?.message ?? errors?.message;

  return (
    <fieldset className="card flex flex-col gap-3">
      <legend className="float-left w-full text-xl font-extrabold">Pickup windows</legend>
      <p className="text-muted">
        When customers can come for their boxes, in the bake day’s time zone. A cap limits the orders in one window;
        leave it blank for no limit.
      </p>
      <ol className="flex flex-col gap-3">
        {rows.fields.map((row, index) => {
          const n = index + 1;
          const rowErrors = errors?.[index];
          const id = (name: string) => `window-${row.id}-${name}`;
          return (
            <li key={row.id}>
              <fieldset className="rounded-2xl border border-line p-3">
                <legend className="px-1 text-sm font-extrabold text-muted">Pickup window {n}</legend>
                <div className="grid grid-cols-2 items-start gap-3 sm:grid-cols-[1fr_1fr_1fr_auto]">
                  <FieldShell id={id('start')} label="Starts" error={rowErrors?.start?.message}>
                    {(input) => <input {...input} type="time" {...register(`windows.${index}.start`)} />}
                  </FieldShell>
                  <FieldShell id={id('end')} label="Ends" error={rowErrors?.end?.message}>
                    {(input) => <input {...input} type="time" {...register(`windows.${index}.end`)} />}
                  </FieldShell>
                  <FieldShell id={id('cap')} label="Most orders" optional error={rowErrors?.maxOrders?.message}>
                    {(input) => (
                      <input {...input} type="text" inputMode="numeric" autoComplete="off" {...register(`windows.${index}.maxOrders`)} />
                    )}
                  </FieldShell>
                  <div className="self-end pb-1">
                    <RemoveRowButton
                      label={`Remove pickup window ${n}`}
                      disabled={rows.fields.length <= 1}
                      onRemove={() => {
                        rows.remove(index);
                        addRef.current?.focus();
                      }}
                    />
                  </div>
                </div>
              </fieldset>
            </li>
          );
        })}
      </ol>
      <ListError message={listError} />
      <button
        ref={addRef}
        type="button"
        className="btn btn-quiet btn-small self-start"
        disabled={rows.fields.length >= MAX_WINDOWS}
        onClick={() => rows.append(nextWindow(getValues('windows')), { focusName: `windows.${rows.fields.length}.start` })}
      >
        Add a pickup window
      </button>
    </fieldset>
  );
}
