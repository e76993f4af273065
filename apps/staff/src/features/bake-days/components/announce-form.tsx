import { useEffect, useRef, useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { CreateBakeDayInput, MenuItemAdminView } from '@fryline/schemas';
import { isApiError } from '@fryline/ui/api-client';
import { useCreateBakeDay } from '../api/use-create-bake-day';
import { announcedFrom } from '../model/announced';
import {
  newBakeDayFormSchema,
  offeredRows,
  placeServerErrors,
  type NewBakeDayValues,
} from '../model/new-bake-day-form';
import { zoneGroups, zoneName } from '../model/time-zones';
import { BoxesFieldset } from './boxes-fieldset';
import { FieldShell } from '@fryline/ui';
import { MenuFieldset } from './menu-fieldset';
import { PickupWindowsFieldset } from './pickup-windows-fieldset';

interface AnnounceFormProps {
  defaults: NewBakeDayValues;
  menuItems: readonly MenuItemAdminView[];
  /** Rings the equipment makes in a bake day; undefined when it could not be worked out. */
  equipmentRings: number | undefined;
  /** Today in the browser, to keep the date picker from offering past days. */
  today: string;
}

const CHECK_AGAIN = 'Some answers need another look: see the messages beside them.';

const wholeNumber = { type: 'number', inputMode: 'numeric', min: 0, step: 1 } as const;

/** The form that announces a bake day: publish it for pre-orders, or keep it as a draft. */
export function AnnounceForm({ defaults, menuItems, equipmentRings, today }: AnnounceFormProps) {
  const navigate = useNavigate();
  const create = useCreateBakeDay();
  const form = useForm<NewBakeDayValues, unknown, CreateBakeDayInput>({
    resolver: zodResolver(newBakeDayFormSchema),
    defaultValues: defaults,
  });
  const { register, formState, setValue } = form;
  const { errors } = formState;
  const [problems, setProblems] = useState<string[]>([]);
  const [above, setAbove] = useState<{ body: CreateBakeDayInput; message: string } | null>(null);
  const problemsRef = useRef<HTMLDivElement>(null);
  const aboveRef = useRef<HTMLDivElement>(null);
  const formRef = useRef<HTMLFormElement>(null);
  /** Holes follow rings until the owner types a hole figure of their own. */
  const holesTyped = useRef(false);
  const timeZone = form.watch('timeZone');

  useEffect(() => {
    if (above) aboveRef.current?.focus();
  }, [above]);

  // After a failed try, start from the summary unless the form has put focus on a field it can point at
  // (a list-wide problem, or an answer from the server, leaves it on the button or nowhere).
  useEffect(() => {
    if (problems.length === 0) return;
    const active = document.activeElement;
    const onField = active instanceof HTMLElement && formRef.current?.contains(active) && active.matches('input, select, textarea');
    if (!onField) problemsRef.current?.focus();
  }, [problems]);

  const send = (body: CreateBakeDayInput) => {
    setProblems([]);
    create.mutate(body, {
      onSuccess: (day) => navigate('/bake-days', { state: { announced: announcedFrom(day, body.publish) } }),
      onError: (error) => {
        if (isApiError(error, 'above_equipment')) {
          setAbove({ body: { ...body, acceptAboveEquipment: true }, message: error.message });
          return;
        }
        setAbove(null);
        const offered = offeredRows(form.getValues('boxes'));
        const left = placeServerErrors(error, offered, (path, fieldError) =>
          form.setError(path as Parameters<typeof form.setError>[0], fieldError),
        );
        setProblems(['The bake day was not saved.', ...(left.length > 0 ? left : [CHECK_AGAIN])]);
      },
    });
  };

  const submit = form.handleSubmit(
    (body) => {
      setAbove(null);
      send(body);
    },
    () => setProblems([CHECK_AGAIN]),
  );

  const busy = create.isPending;
  const id = (name: string) => `new-day-${name}`;

  return (
    <form
      ref={formRef}
      onSubmit={(event) => void submit(event)}
      // A question about what was sent lapses once the form changes: it is asked again on the next try.
      onChange={() => above && setAbove(null)}
      noValidate
      className="flex flex-col gap-4"
      aria-label="New bake day"
    >
      <fieldset className="card flex flex-col gap-3">
        <legend className="float-left w-full text-xl font-extrabold">When and where</legend>
        <div className="grid gap-x-4 gap-y-3 sm:grid-cols-2">
          <FieldShell id={id('date')} label="Date" error={errors.date?.message}>
            {(input) => <input {...input} type="date" min={today} {...register('date')} />}
          </FieldShell>
          <FieldShell id={id('zone')} label="Time zone" help="Pickup windows and the times below are in this zone." error={errors.timeZone?.message}>
            {(input) => (
              <select {...input} {...register('timeZone')}>
                {zoneGroups(defaults.timeZone).map((group) => (
                  <optgroup key={group.region} label={group.region}>
                    {group.zones.map((choice) => (
                      <option key={choice.zone} value={choice.zone}>
                        {choice.label}
                      </option>
                    ))}
                  </optgroup>
                ))}
              </select>
            )}
          </FieldShell>
          <FieldShell id={id('place')} label="Place" help="As customers will see it, like a market and stall number." error={errors.place?.message}>
            {(input) => <input {...input} type="text" autoComplete="off" {...register('place')} />}
          </FieldShell>
          <FieldShell id={id('address')} label="Address" optional error={errors.address?.message}>
            {(input) => <input {...input} type="text" autoComplete="off" {...register('address')} />}
          </FieldShell>
        </div>
      </fieldset>

      <PickupWindowsFieldset form={form} />
      <MenuFieldset form={form} items={menuItems} />
      <BoxesFieldset form={form} />

      <fieldset className="card flex flex-col gap-3">
        <legend className="float-left w-full text-xl font-extrabold">Capacity</legend>
        <p className="text-muted">
          The most customers can order that day. Each ring’s centre is cut out as a hole, so holes start at the same
          number as rings.
        </p>
        <div className="grid grid-cols-2 gap-x-4 gap-y-3 sm:max-w-md">
          <FieldShell id={id('rings')} label="Rings" error={errors.ringCapacity?.message}>
            {(input) => (
              <input
                {...input}
                {...wholeNumber}
                {...register('ringCapacity', {
                  valueAsNumber: true,
                  onChange: (event: { target: { valueAsNumber: number } }) => {
                    if (!holesTyped.current) setValue('holeCapacity', event.target.valueAsNumber);
                  },
                })}
              />
            )}
          </FieldShell>
          <FieldShell id={id('holes')} label="Holes" error={errors.holeCapacity?.message}>
            {(input) => (
              <input
                {...input}
                {...wholeNumber}
                {...register('holeCapacity', {
                  valueAsNumber: true,
                  onChange: () => {
                    holesTyped.current = true;
                  },
                })}
              />
            )}
          </FieldShell>
        </div>
        <p className="text-sm text-muted">
          {equipmentRings === undefined
            ? 'What the equipment makes could not be worked out just now; check the Equipment page.'
            : `The equipment makes about ${equipmentRings} rings a bake day. Fewer is always fine; more asks you to confirm.`}
        </p>
      </fieldset>

      <fieldset className="card flex flex-col gap-3">
        <legend className="float-left w-full text-xl font-extrabold">Pre-orders</legend>
        <p className="text-muted">Times in {zoneName(timeZone)} time.</p>
        <div className="grid gap-x-4 gap-y-3 sm:grid-cols-2">
          <FieldShell
            id={id('opens')}
            label="Orders open"
            optional
            help="Leave blank to open pre-orders as soon as the bake day is published."
            error={errors.ordersOpenAt?.message}
          >
            {(input) => <input {...input} type="datetime-local" {...register('ordersOpenAt')} />}
          </FieldShell>
          <FieldShell
            id={id('cutoff')}
            label="Orders close (cut-off)"
            optional
            help="Normally worked out from the production schedule, so the dough can be started in time for the first pickup. Leave it blank unless you need orders to close earlier."
            error={errors.cutoffAt?.message}
          >
            {(input) => <input {...input} type="datetime-local" {...register('cutoffAt')} />}
          </FieldShell>
        </div>
      </fieldset>

      {above && (
        <div ref={aboveRef} tabIndex={-1} role="alert" className="notice notice-warn flex flex-col gap-2">
          <p className="font-extrabold">{above.message}</p>
          <p className="text-sm">
            More than the equipment allows means a longer night, more batches in the oil and less room for mistakes.
          </p>
          <div className="flex flex-wrap gap-2">
            <button type="button" className="btn btn-primary btn-small" disabled={busy} onClick={() => send(above.body)}>
              {busy && <span className="spinner" aria-hidden="true" />}
              Offer {above.body.ringCapacity} rings anyway
            </button>
            <button
              type="button"
              className="btn btn-quiet btn-small"
              disabled={busy}
              onClick={() => {
                setAbove(null);
                form.setFocus('ringCapacity');
              }}
            >
              Change the capacity
            </button>
          </div>
        </div>
      )}

      {problems.length > 0 && (
        <div ref={problemsRef} tabIndex={-1} role="alert" className="notice notice-bad">
          {problems.map((problem) => (
            <p key={problem}>{problem}</p>
          ))}
        </div>
      )}

      <div className="flex flex-col gap-3">
        <p id={id('publish-help')} className="text-sm text-muted">
          Publishing puts the bake day in the shop: customers can pre-order from the time orders open. A draft is
          kept under Drafts on the Bake days page, not shown to customers until you publish it.
        </p>
        <div className="flex flex-col gap-3 sm:flex-row sm:flex-wrap sm:items-center">
          <button
            type="submit"
            className="btn btn-primary"
            disabled={busy}
            aria-describedby={id('publish-help')}
            onClick={() => setValue('publish', true)}
          >
            {busy && form.getValues('publish') && <span className="spinner" aria-hidden="true" />}
            Publish bake day
          </button>
          <button
            type="submit"
            className="btn btn-quiet"
            disabled={busy}
            aria-describedby={id('publish-help')}
            onClick={() => setValue('publish', false)}
          >
            {busy && !form.getValues('publish') && <span className="spinner" aria-hidden="true" />}
            Save as draft
          </button>
          <Link to="/bake-days" className="btn btn-quiet sm:ml-auto">
            Cancel
          </Link>
        </div>
      </div>
    </form>
  );
}
