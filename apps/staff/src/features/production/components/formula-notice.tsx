import { useQuery } from '@tanstack/react-query';
import { errorMessage } from '@fryline/ui/api-client';
import type { PlanMeta } from '@fryline/schemas';
import { productionQueries } from '../../../lib/queries/production-queries';
import { useSwitchFormula } from '../api/use-switch-formula';
import { formulaStatus } from '../model/sheet';

/**
 * Which formula version the sheet uses. A newer version never takes over by
 * itself: the baker switches on purpose, here.
 */
export function FormulaNotice({ meta }: { meta: PlanMeta }) {
  const status = formulaStatus(meta);
  const formulas = useQuery({ ...productionQueries.formulas(), enabled: status.newer !== null });
  const switchFormula = useSwitchFormula(meta.bakeDay.id);
  const latest = formulas.data?.current;

  const made = (
    <p className="text-sm text-muted">
      Made with {status.label}
      {status.newer === null ? ', the newest.' : '.'}
    </p>
  );
  if (status.newer === null) return made;
  const target = latest?.version ?? status.newer;
  return (
    <>
      {made}
      <div className="notice notice-warn flex flex-col gap-2" data-print="hide">
        <p>
          <span className="font-extrabold">A newer formula is saved: version {target}.</span> This sheet still uses{' '}
          {status.label}, and keeps it until you switch.
        </p>
        {switchFormula.isError && (
          <p role="alert" className="font-semibold text-brick-700">
            {errorMessage(switchFormula.error)}
          </p>
        )}
        <button
          type="button"
          className="btn btn-primary btn-small self-start"
          disabled={!latest?.id || switchFormula.isPending}
          onClick={() => latest?.id && switchFormula.mutate(latest.id)}
        >
          {switchFormula.isPending && <span className="spinner" aria-hidden="true" />}
          Switch this bake day to version {target}
        </button>
      </div>
    </>
  );
}
