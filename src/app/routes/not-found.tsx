import { Link } from 'react-router-dom';
import { EmptyState } from '../../components/ui';

export function NotFoundPage() {
  return (
    <div className="p-6">
      <EmptyState
        title="Nothing here"
        action={
          <Link className="text-cellar-700 underline" to="/">
            Go to the home screen
          </Link>
        }
      >
        This address does not lead to a page in Kettlewright.
      </EmptyState>
    </div>
  );
}
