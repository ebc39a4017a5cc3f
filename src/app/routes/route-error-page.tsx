import { isRouteErrorResponse, useRouteError } from 'react-router-dom';
import { MotifoldWordmark } from '../../components/brand/motifold-mark';
import { ButtonLink } from '../../components/ui/button';
import { ErrorState } from '../../components/ui/error-state';
import { NotFoundPage } from './not-found-page';

// Last resort for a loader that failed or a page that threw while drawing.
export function RouteErrorPage() {
  const error = useRouteError();
  const notFound = isRouteErrorResponse(error) && error.status === 404;
  return (
    <div className="min-h-screen px-4 py-8 sm:px-10">
      <MotifoldWordmark />
      <main id="main" tabIndex={-1} className="mx-auto mt-12 max-w-xl">
        {notFound ? (
          <NotFoundPage />
        ) : (
          <>
            <h1 className="mb-4 text-3xl font-semibold">This page stopped working</h1>
            <ErrorState error={error} title="Something went wrong" onRetry={() => window.location.reload()} />
            <ButtonLink to="/" variant="quiet" className="mt-4">
              Go to your studio home
            </ButtonLink>
          </>
        )}
      </main>
    </div>
  );
}
