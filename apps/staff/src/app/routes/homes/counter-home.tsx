import { Link } from 'react-router-dom';
import { PageFrame } from '../../../components/page-frame';
import { NextBakeDay } from '../../../features/bake-days/components/next-bake-day';

export function CounterHome() {
  return (
    <PageFrame title="Counter — pickups" intro="Hand over pre-orders quickly and keep the pickup list right.">
      <NextBakeDay>
        {() => (
          <Link className="btn btn-primary self-start" to="/pickups">
            Open the pickup list
          </Link>
        )}
      </NextBakeDay>
      <section aria-labelledby="counter-tips" className="card">
        <h2 id="counter-tips" className="text-lg">
          At the stand
        </h2>
        <ul className="mt-2 list-disc space-y-1 pl-5">
          <li>Ask for the pickup code, or the name on the order.</li>
          <li>Check the boxes against the order before handing them over.</li>
          <li>Customers with allergies: point them to the allergen list on their order; do not guess.</li>
        </ul>
      </section>
    </PageFrame>
  );
}
