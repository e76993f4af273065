import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { shopCurrencies, type ShopSettingsInput, type ShopSettingsView } from '@fryline/schemas';
import { FieldShell, fieldAria } from '@fryline/ui';
import { putFieldErrors } from '@fryline/ui/api-client';
import { formatDateTime } from '@fryline/ui/format';
import { ZoneOptions } from '../../../lib/zone-options';
import { useSaveShopSettings } from '../api/shop-settings-queries';
import { formFromSettings, settingsFormSchema, type SettingsFormValues } from '../model/settings-form';

const currencyNames: Record<(typeof shopCurrencies)[number], string> = {
  usd: 'US dollar (USD)',
  cad: 'Canadian dollar (CAD)',
  eur: 'Euro (EUR)',
  gbp: 'Pound sterling (GBP)',
  aud: 'Australian dollar (AUD)',
  nzd: 'New Zealand dollar (NZD)',
};

const fields = ['shopName', 'timeZone', 'currency', 'tax.mode', 'tax.rateBasisPoints', 'holdMinutes', 'noShowGraceMinutes', 'refundPolicy'] as const;

export function ShopSettingsForm({ settings }: { settings: ShopSettingsView }) {
  const save = useSaveShopSettings();
  const form = useForm<SettingsFormValues, unknown, ShopSettingsInput>({
    resolver: zodResolver(settingsFormSchema),
    defaultValues: formFromSettings(settings),
  });
  const { register, formState } = form;
  const { errors } = formState;
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const timeZone = form.watch('timeZone');
  const aria = (id: string, error?: string, help = true) => fieldAria(id, help, error);

  const submit = form.handleSubmit((body) => {
    setMessage(null);
    save.mutate(body, {
      onSuccess: () => setMessage({ ok: true, text: 'Saved. New orders use these settings from now on.' }),
      onError: (error) => {
        const left = putFieldErrors(error, form.setError, fields);
        setMessage({ ok: false, text: left.length > 0 ? left.join(' ') : 'Not saved: see the messages beside the fields.' });
      },
    });
  });

  return (
    <form onSubmit={(event) => void submit(event)} noValidate className="flex flex-col gap-5" aria-label="Shop settings">
      <section className="card grid gap-x-4 gap-y-4 sm:grid-cols-2" aria-labelledby="shop-heading">
        <h2 id="shop-heading" className="text-xl sm:col-span-2">The shop</h2>
        <FieldShell id="set-name" label="Shop name" help="In the shop's header and every e-mail." error={errors.shopName?.message}>
          <input id="set-name" className="field-input" autoComplete="organization" {...aria('set-name', errors.shopName?.message)} {...register('shopName')} />
        </FieldShell>
        <FieldShell id="set-zone" label="Time zone" help="Weeks in the sales pages and days in the audit log are counted in it." error={errors.timeZone?.message}>
          <select id="set-zone" className="field-input" {...aria('set-zone', errors.timeZone?.message)} {...register('timeZone')}>
            <ZoneOptions current={timeZone} />
          </select>
        </FieldShell>
      </section>

      <section className="card grid gap-x-4 gap-y-4 sm:grid-cols-2" aria-labelledby="money-heading">
        <h2 id="money-heading" className="text-xl sm:col-span-2">Money and tax</h2>
        <FieldShell id="set-currency" label="Currency" help="What customers pay in, and how every amount is shown. Amounts already paid are not converted: change it before orders open." error={errors.currency?.message}>
          <select id="set-currency" className="field-input" {...aria('set-currency', errors.currency?.message)} {...register('currency')}>
            {shopCurrencies.map((c) => (
              <option key={c} value={c}>
                {currencyNames[c]}
              </option>
            ))}
          </select>
        </FieldShell>
        <fieldset>
          <legend className="field-label">Prices and tax</legend>
          <div className="flex flex-col gap-2 pt-1">
            <label className="flex items-center gap-2">
              <input type="radio" value="included" className="size-4 accent-plum-700" {...register('tax.mode')} /> Prices include tax
            </label>
            <label className="flex items-center gap-2">
              <input type="radio" value="added" className="size-4 accent-plum-700" {...register('tax.mode')} /> Tax is added at checkout
            </label>
          </div>
        </fieldset>
        <FieldShell id="set-rate" label="Tax rate" unit="%" help="0 if you don't charge tax. Ask your local tax office what applies to you." error={errors.tax?.rateBasisPoints?.message}>
          <input id="set-rate" className="field-input" inputMode="decimal" {...aria('set-rate', errors.tax?.rateBasisPoints?.message)} {...register('tax.rateBasisPoints')} />
        </FieldShell>
      </section>

      <section className="card grid gap-x-4 gap-y-4 sm:grid-cols-2" aria-labelledby="orders-heading">
        <h2 id="orders-heading" className="text-xl sm:col-span-2">Orders and pickups</h2>
        <FieldShell id="set-hold" label="Hold a box while paying for" unit="minutes" help="An unpaid box goes back on sale after this. 5 to 120." error={errors.holdMinutes?.message}>
          <input id="set-hold" className="field-input" type="number" inputMode="numeric" min={5} max={120} {...aria('set-hold', errors.holdMinutes?.message)} {...register('holdMinutes')} />
        </FieldShell>
        <FieldShell id="set-grace" label="Wait before marking a no-show" unit="minutes" help="After the end of the pickup window, before the counter may mark an order not collected." error={errors.noShowGraceMinutes?.message}>
          <input id="set-grace" className="field-input" type="number" inputMode="numeric" min={0} max={1440} {...aria('set-grace', errors.noShowGraceMinutes?.message)} {...register('noShowGraceMinutes')} />
        </FieldShell>
        <FieldShell
          id="set-policy"
          label="Refund policy"
          className="sm:col-span-2"
          help="Customers read this on the last step before they pay. Say when they can cancel, and what happens to boxes not collected."
          error={errors.refundPolicy?.message}
        >
          <textarea id="set-policy" rows={4} className="field-input" {...aria('set-policy', errors.refundPolicy?.message)} {...register('refundPolicy')} />
        </FieldShell>
      </section>

      {message && (
        <p role={message.ok ? 'status' : 'alert'} className={`notice ${message.ok ? 'notice-ok' : 'notice-bad'}`}>
          {message.text}
        </p>
      )}
      <div className="flex flex-wrap items-center gap-3">
        <button type="submit" className="btn btn-primary" disabled={save.isPending}>
          {save.isPending && <span className="spinner" aria-hidden="true" />}
          Save the settings
        </button>
        {settings.updatedAt && <span className="text-sm text-muted">Last changed {formatDateTime(settings.updatedAt, settings.timeZone)}</span>}
      </div>
    </form>
  );
}
