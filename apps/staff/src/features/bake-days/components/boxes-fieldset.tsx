import { useWatch } from 'react-hook-form';
import { boxCatalogue, boxTakes, type BoxSize } from '@fryline/schemas';
import { ListError } from '../../../components/row-controls';
import { FieldShell, useCurrencyName, useCurrencySign } from '@fryline/ui';
import type { NewBakeDayForm } from './pickup-windows-fieldset';

/** "Offer a dozen (12 rings)", "Price of a dozen": the catalogue's names in the form's words. */
function boxWords(size: BoxSize): { offer: string; price: string } {
  const box = boxCatalogue[size];
  const name = box.label.toLowerCase();
  const fixed = box.takes === 'ring' ? ` (${box.pieces} rings)` : '';
  return { offer: `Offer ${name}${fixed}`, price: `Price of ${name}` };
}

/** The boxes on sale that day, each with its price in the shop's currency; the bag of holes also says how many it holds. */
export function BoxesFieldset({ form }: { form: NewBakeDayForm }) {
  const sign = useCurrencySign();
  const currencyName = useCurrencyName();
  const { register, control, formState } = form;
  const boxes = useWatch({ control, name: 'boxes' });
  const errors = formState.errors.boxes;
  const listError = errors?.root?.message ?? errors?.message;

  return (
    <fieldset className="card flex flex-col gap-3">
      <legend className="float-left w-full text-xl font-extrabold">Boxes and prices</legend>
      <p className="text-muted">
        Prices in {currencyName}. A menu item with an extra charge adds it on top, for each one in the box.
      </p>
      <ul className="flex flex-col gap-3">
        {boxes.map((box, index) => {
          const words = boxWords(box.size);
          const rowErrors = errors?.[index];
          const id = `box-${box.size}`;
          return (
            <li key={box.size} className="rounded-2xl border border-line p-3">
              <label className="flex min-h-11 cursor-pointer items-center gap-3 font-extrabold">
                <input type="checkbox" className="size-5 accent-plum-800" {...register(`boxes.${index}.offered`)} />
                {words.offer}
              </label>
              {box.offered && (
                <div className="mt-2 grid grid-cols-2 gap-3 sm:max-w-md">
                  <FieldShell id={`${id}-price`} label={`${words.price} (${sign})`} error={rowErrors?.price?.message}>
                    {(input) => (
                      <div className="relative">
                        <span aria-hidden="true" className="absolute inset-y-0 left-3 flex items-center font-semibold text-muted">
                          $
                        </span>
                        <input
                          {...input}
                          className={`${input.className} pl-7 tabular-nums`}
                          type="text"
                          inputMode="decimal"
                          autoComplete="off"
                          {...register(`boxes.${index}.price`)}
                        />
                      </div>
                    )}
                  </FieldShell>
                  {boxTakes(box.size) === 'hole' && (
                    <FieldShell id={`${id}-pieces`} label="Holes in a bag" error={rowErrors?.pieces?.message}>
                      {(input) => (
                        <input {...input} type="number" inputMode="numeric" min={1} max={60} step={1} {...register(`boxes.${index}.pieces`, { valueAsNumber: true })} />
                      )}
                    </FieldShell>
                  )}
                </div>
              )}
            </li>
          );
        })}
      </ul>
      <ListError message={listError} />
    </fieldset>
  );
}
