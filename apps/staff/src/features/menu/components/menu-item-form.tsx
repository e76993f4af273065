import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { MenuItemAdminView, MenuItemInput, ProductionSettingsInput } from '@fryline/schemas';
import { FieldShell, fieldAria, useCurrencySign } from '@fryline/ui';
import { putFieldErrors } from '@fryline/ui/api-client';
import { useSaveMenuItem } from '../api/use-menu-mutations';
import { allergenChoices, blankMenuForm, formFromItem, menuFormSchema, patchFrom, type MenuFormValues } from '../model/menu-form';
import { PhotoField } from './photo-field';

type Glaze = ProductionSettingsInput['glazes'][number];

const fields = ['name', 'kind', 'flavour', 'glaze', 'glazeRecipeId', 'allergens', 'description', 'surchargeCents'] as const;

/** Adds an item, or edits one, with its photo. */
export function MenuItemForm({ item, glazes, initialPhotoError }: { item?: MenuItemAdminView; glazes: readonly Glaze[]; initialPhotoError?: string }) {
  const sign = useCurrencySign();
  const navigate = useNavigate();
  const save = useSaveMenuItem();
  const form = useForm<MenuFormValues, unknown, MenuItemInput>({
    resolver: zodResolver(menuFormSchema),
    defaultValues: item ? formFromItem(item) : blankMenuForm,
  });
  const { register, formState, setValue, getValues } = form;
  const { errors } = formState;
  const [photo, setPhoto] = useState<File | null>(null);
  const [photoError, setPhotoError] = useState<string | undefined>(initialPhotoError);
  const [removePhoto, setRemovePhoto] = useState(false);
  const [problems, setProblems] = useState<string[]>(initialPhotoError ? ['The item is saved, but not the photo.'] : []);
  const name = form.watch('name');

  const aria = (id: string, error?: string, help?: boolean) => fieldAria(id, help, error);

  const submit = form.handleSubmit((input) => {
    if (photoError) return;
    setProblems([]);
    save.mutate(
      { id: item?.id, body: item ? patchFrom(item, input) : input, photo, removePhoto },
      {
        onSuccess: ({ item: saved, photoError: refused }) => {
          if (refused) {
            // the item is saved: carry on from its own page, where another photo can be tried
            setPhoto(null);
            setPhotoError(refused);
            setProblems([`${saved.name} is saved, but not the photo.`]);
            if (!item) navigate(`/menu/${saved.id}`, { replace: true, state: { photoError: refused } });
            return;
          }
          navigate('/menu', { state: { saved: `${saved.name} is saved${photo ? ' with its photo' : ''}.` } });
        },
        onError: (error) => {
          const left = putFieldErrors(error, form.setError, fields);
          setProblems(left.length > 0 ? left : ['Some answers need another look: see the messages beside them.']);
        },
      },
    );
  });

  const chooseGlaze = (recipeId: string) => {
    const recipe = glazes.find((g) => g.id === recipeId);
    if (!recipe) return;
    // the glaze's own allergens go on the item; the owner can still untick them
    const ticked = new Set(getValues('allergens'));
    for (const allergen of recipe.allergens ?? []) if ((allergenChoices as readonly string[]).includes(allergen)) ticked.add(allergen as never);
    setValue('allergens', allergenChoices.filter((a) => ticked.has(a)));
    if (!getValues('glaze')?.trim()) setValue('glaze', recipe.name);
  };

  return (
    <form onSubmit={(event) => void submit(event)} noValidate className="card flex flex-col gap-5" aria-label={item ? `Edit ${item.name}` : 'New menu item'}>
      <div className="grid gap-x-4 gap-y-4 sm:grid-cols-2">
        <FieldShell id="menu-name" label="Name" error={errors.name?.message}>
          <input id="menu-name" className="field-input" autoComplete="off" {...aria('menu-name', errors.name?.message)} {...register('name')} />
        </FieldShell>
        <fieldset>
          <legend className="field-label">Kind</legend>
          <div className="flex gap-4 pt-2">
            <label className="flex items-center gap-2">
              <input type="radio" value="ring" className="size-4 accent-plum-700" {...register('kind')} /> Ring
            </label>
            <label className="flex items-center gap-2">
              <input type="radio" value="hole" className="size-4 accent-plum-700" {...register('kind')} /> Hole
            </label>
          </div>
          {errors.kind && <p className="field-error">{errors.kind.message}</p>}
        </fieldset>
        <FieldShell id="menu-flavour" label="Flavour" help="What is in the dough: vanilla bean, brown butter, plain…" error={errors.flavour?.message}>
          <input id="menu-flavour" className="field-input" autoComplete="off" {...aria('menu-flavour', errors.flavour?.message, true)} {...register('flavour')} />
        </FieldShell>
        <FieldShell id="menu-recipe" label="Glaze recipe" help="From the glaze recipes on the Equipment page; the production sheet works out how much to make." error={errors.glazeRecipeId?.message}>
          <select
            id="menu-recipe"
            className="field-input"
            {...aria('menu-recipe', errors.glazeRecipeId?.message, true)}
            {...register('glazeRecipeId', { onChange: (event) => chooseGlaze(event.target.value) })}
          >
            <option value="">No glaze</option>
            {glazes.map((g) => (
              <option key={g.id} value={g.id}>
                {g.name}
              </option>
            ))}
          </select>
        </FieldShell>
        <FieldShell id="menu-glaze" label="Glaze as customers read it" optional help="Leave empty to use the recipe's name." error={errors.glaze?.message}>
          <input id="menu-glaze" className="field-input" autoComplete="off" {...aria('menu-glaze', errors.glaze?.message, true)} {...register('glaze')} />
        </FieldShell>
        <FieldShell id="menu-surcharge" label="Extra charge per piece" unit={sign} help="Added to the box price for each one in a box; 0 for none." error={errors.surchargeCents?.message}>
          <input id="menu-surcharge" className="field-input" inputMode="decimal" autoComplete="off" {...aria('menu-surcharge', errors.surchargeCents?.message, true)} {...register('surchargeCents')} />
        </FieldShell>
        <FieldShell id="menu-description" label="Short description" optional className="sm:col-span-2" error={errors.description?.message}>
          <textarea id="menu-description" rows={2} className="field-input" {...aria('menu-description', errors.description?.message)} {...register('description')} />
        </FieldShell>
      </div>

      <fieldset aria-describedby="allergens-help">
        <legend className="field-label">Allergens</legend>
        <p id="allergens-help" className="mb-2 text-sm text-muted">
          The nine major food allergens. Tick all that are in it, glaze and toppings included; customers see them before they pay.
        </p>
        <div className="grid grid-cols-2 gap-2 sm:grid-cols-3">
          {allergenChoices.map((allergen) => (
            <label key={allergen} className="flex items-center gap-2 rounded-xl border-2 border-line bg-white px-3 py-2">
              <input type="checkbox" value={allergen} className="size-4 accent-plum-700" {...register('allergens')} />
              {allergen}
            </label>
          ))}
        </div>
        {errors.allergens && <p className="field-error">{errors.allergens.message ?? 'Choose from the list'}</p>}
      </fieldset>

      <PhotoField
        current={item?.photo}
        itemName={name}
        chosen={photo}
        remove={removePhoto}
        error={photoError}
        onChoose={(file, problem) => {
          setPhoto(problem ? null : file);
          setPhotoError(problem ?? undefined);
        }}
        onRemove={setRemovePhoto}
      />

      {problems.length > 0 && (
        <div role="alert" className="notice notice-bad">
          {problems.map((p) => (
            <p key={p}>{p}</p>
          ))}
        </div>
      )}
      <div className="flex flex-wrap gap-3">
        <button type="submit" className="btn btn-primary" disabled={save.isPending}>
          {save.isPending && <span className="spinner" aria-hidden="true" />}
          {item ? 'Save changes' : 'Add to the menu'}
        </button>
        <button type="button" className="btn btn-quiet" onClick={() => navigate('/menu')}>
          Cancel
        </button>
      </div>
    </form>
  );
}
