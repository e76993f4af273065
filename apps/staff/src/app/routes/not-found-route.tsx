import { Link } from 'react-router-dom';
import { PageFrame } from '../../components/page-frame';

export function NotFoundRoute() {
  return (
    <PageFrame title="No such page" intro="The link may be old.">
      <Link className="btn btn-primary self-start" to="/">
        Back to your home page
      </Link>
    </PageFrame>
  );
}
