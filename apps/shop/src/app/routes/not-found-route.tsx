import { Link } from 'react-router-dom';
import { PageTitle } from '../../components/page-title';

export function NotFoundRoute() {
  return (
    <section className="flex flex-col items-start gap-4">
      <PageTitle>Page not found</PageTitle>
      <h1 tabIndex={-1} className="text-3xl">
        We could not find that page
      </h1>
      <p>The link may be old, or the page may have moved.</p>
      <Link className="btn btn-primary" to="/">
        See the bake days
      </Link>
    </section>
  );
}
