import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { saveFormulaSchema, type FormulaList } from '@fryline/schemas';
import { PageFrame } from '../../../components/page-frame';
import { ErrorState, LoadingState } from '@fryline/ui';
import { putFieldErrors } from '@fryline/ui/api-client';
import { productionQueries } from '../../../lib/queries/production-queries';
import { useSaveFormula } from '../api/use-save-formula';
import { formulaFieldNames, previewFormula, SAMPLE_DOUGH_GRAMS, toFormValues, type FormulaFormValues } from '../model/formula-form';
import { FormulaPreview } from './formula-preview';
import { FormulaVersions } from './formula-versions';
import { IngredientTable } from './ingredient-table';

const INTRO = "The dough in baker's percentages: every flour line together is 100 %, and every other line is grams per 100 g of flour.";

export default function FormulaEditorPage() {
  const formulas = useQuery(productionQueries.formulas());
  return (
    <PageFrame eyebrow="Baker" title="Formula" intro={INTRO}>
      {formulas.isPending ? (
        <LoadingState label="Loading the formula…" />
      ) : formulas.isError ? (
        <ErrorState error={formulas.error} title="The formula could not be loaded" onRetry={() => void formulas.refetch()} />
      ) : (
        <FormulaEditor list={formulas.data} />
      )}
    </PageFrame>
  );
}

function FormulaEditor({ list }: { list: FormulaList }) {
  const save = useSaveFormula();
  const [sampleGrams, setSampleGrams] = useState(SAMPLE_DOUGH_GRAMS);
  const [saved, setSaved] = useState<number | null>(null);
  const [problems, setProblems] = useState<string[]>([]);
  const form = useForm<FormulaFormValues, unknown, z.output<typeof saveFormulaSchema>>({
    resolver: zodResolver(saveFormulaSchema),
    defaultValues: toFormValues(list.current.formula),
  });
  const formula = useWatch({ control: form.control, name: 'formula' });
  const preview = previewFormula(formula, sampleGrams);

  const submit = form.handleSubmit((values) => {
    setProblems([]);
    setSaved(null);
    save.mutate(values, {
      onSuccess: (version) => {
        form.reset(toFormValues(version.formula));
        setSaved(version.version);
      },
      onError: (error) =>
        setProblems(putFieldErrors(error, form.setError, formulaFieldNames(values.formula.ingredients.length))),
    });
  });

  const loadVersion = (formulaInput: FormulaList['current']['formula'], version: number) => {
    form.reset(toFormValues(formulaInput));
    setSaved(null);
    setProblems([]);
    form.setValue('note', `Based on version ${version}`, { shouldDirty: true });
  };

  return (
    <>
      <form onSubmit={submit} noValidate className="flex flex-col gap-6" aria-label="Formula">
        <IngredientTable form={form} preview={preview} sampleGrams={sampleGrams} onSampleGrams={setSampleGrams} />
        <FormulaPreview preview={preview} sampleGrams={sampleGrams} />
        <section aria-labelledby="save-heading" className="card flex flex-col gap-3">
          <h2 id="save-heading" className="text-xl">
            Save as a new version
          </h2>
          <p className="text-muted">
            Saving never changes a bake day that is already planned: its production sheet keeps the version it was planned
            with until the baker switches it there. Bake days planned from now on use the new version.
          </p>
          <div className="max-w-xl">
            <label htmlFor="formula-note" className="field-label">
              Note for this version
            </label>
            <input
              id="formula-note"
              className="field-input"
              placeholder="What changed, e.g. more butter"
              maxLength={200}
              aria-invalid={form.formState.errors.note ? true : undefined}
              aria-describedby={form.formState.errors.note ? 'formula-note-error' : undefined}
              {...form.register('note')}
            />
            {form.formState.errors.note && (
              <p id="formula-note-error" className="field-error">
                {form.formState.errors.note.message}
              </p>
            )}
          </div>
          {problems.length > 0 && (
            <div role="alert" className="notice notice-bad">
              {problems.map((problem) => (
                <p key={problem}>{problem}</p>
              ))}
            </div>
          )}
          {saved !== null && (
            <p role="status" className="notice notice-ok">
              Saved as version {saved}. Bake days already planned keep their version.
            </p>
          )}
          <button type="submit" className="btn btn-primary self-start" disabled={save.isPending}>
            {save.isPending && <span className="spinner" aria-hidden="true" />}
            Save new version
          </button>
        </section>
      </form>
      <FormulaVersions list={list} onLoad={loadVersion} />
    </>
  );
}
