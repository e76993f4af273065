import { boxTypes } from '@fryline/schemas';
import { listWords } from '@fryline/ui/format';
import { BakeDayList } from '../../features/bake-days/components/bake-day-list';
import { AllergenCaution } from '../../components/allergen-caution';
import { PageTitle } from '../../components/page-title';
import { useQuery } from '@tanstack/react-query';
import { NewsSignup } from '../../features/announcements/components/news-signup';
import { meQueries } from '../../features/auth/api/me-queries';

const steps = [
  { title: 'Pick a bake day', text: 'Choose a date and a pickup window that suits you.' },
  { title: 'Fill a box', text: `${sentence(listWords(boxTypes.map((box) => box.label.toLowerCase()), 'or'))}, in any mix of flavours.` },
  { title: 'Pay up front', text: 'Your box is held for a few minutes while you pay, so nobody else can take it.' },
  { title: 'Pick it up', text: 'Show your pickup code at the stand during your window.' },
];

function sentence(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

export function HomeRoute() {
  const me = useQuery(meQueries.current());
  return (
    <div className="flex flex-col gap-10">
      <PageTitle>Bake days</PageTitle>
      <section className="flex flex-col gap-3">
        <h1 tabIndex={-1} className="max-w-2xl text-4xl text-plum-800 sm:text-5xl">
          Sourdough doughnuts, fried fresh on bake days
        </h1>
        <p className="max-w-2xl text-lg">
          Our dough rises slowly overnight and is fried a few at a time on the morning of each bake day. There is only so
          much dough, so we take pre-orders: choose a box, pay ahead, and collect it at the stand.
        </p>
      </section>

      <section aria-labelledby="upcoming-heading" className="flex flex-col gap-4">
        <h2 id="upcoming-heading" className="text-2xl">
          Upcoming bake days
        </h2>
        <BakeDayList />
      </section>

      <section aria-labelledby="how-heading" className="flex flex-col gap-4">
        <h2 id="how-heading" className="text-2xl">
          How it works
        </h2>
        <ol className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
          {steps.map((step, index) => (
            <li key={step.title} className="card flex gap-3">
              <span
                aria-hidden="true"
                className="flex size-9 shrink-0 items-center justify-center rounded-full bg-sugar-300 font-extrabold text-ink"
              >
                {index + 1}
              </span>
              <span>
                <span className="block font-extrabold">{step.title}</span>
                <span className="text-sm">{step.text}</span>
              </span>
            </li>
          ))}
        </ol>
      </section>

      {/* keyed so a sign-in that arrives after the first paint fills the address in */}
      <NewsSignup key={me.data?.email ?? ''} defaultEmail={me.data?.email ?? ''} />

      <AllergenCaution />
    </div>
  );
}
