import { Link, Outlet } from 'react-router-dom';
import { MotifoldWordmark } from '../../components/brand/motifold-mark';

// Sign-in, sign-up, password reset and invitations: one calm column, no studio chrome.
export function SignedOutLayout() {
  return (
    <div className="flex min-h-screen flex-col">
      <header className="px-6 pt-8 pb-2 sm:px-10">
        <Link to="/" className="inline-block rounded-md">
          <MotifoldWordmark />
        </Link>
      </header>
      <main id="main" tabIndex={-1} className="flex flex-1 justify-center px-4 py-8 sm:px-6 sm:py-12">
        <div className="w-full max-w-md">
          <Outlet />
        </div>
      </main>
      <footer className="px-6 pb-8 text-center text-sm text-ink-soft">
        Motifold cuts layered originals into motifs and puts them on print-ready products.
      </footer>
    </div>
  );
}
