import { lazy, Suspense, type ComponentType } from 'react';
import { LoadingState } from '@fryline/ui';

/**
 * A page whose code loads the first time it is opened, with a loading line
 * meanwhile. For pages that bring heavy modules (the bake maths and its
 * date library) the rest of the app does not need.
 */
export function lazyPage(load: () => Promise<{ default: ComponentType }>, loadingLabel: string): ComponentType {
  const Page = lazy(load);
  return function LazyPage() {
    return (
      <Suspense fallback={<LoadingState label={loadingLabel} />}>
        <Page />
      </Suspense>
    );
  };
}
