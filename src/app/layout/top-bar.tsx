import { Link } from 'react-router-dom';
import { MotifoldWordmark } from '../../components/brand/motifold-mark';
import { NotificationsControl } from '../../features/notifications/components/notifications-control';
import { MainNav } from './main-nav';
import { StudioSwitcher } from './studio-switcher';
import { UserMenu } from './user-menu';

// Two rows below 1024 px (brand, studio and account above; navigation below), one row above.
export function TopBar() {
  return (
    <header className="border-b border-sand bg-paper/80">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-1 px-4 py-2 sm:px-6 lg:flex-nowrap">
        <Link to="/" className="shrink-0 rounded-md" aria-label="Motifold, studio home">
          <MotifoldWordmark />
        </Link>
        <div className="order-last w-full lg:order-none lg:w-auto lg:flex-1">
          <MainNav />
        </div>
        <div className="ml-auto flex min-w-0 items-center gap-3 lg:ml-0">
          <StudioSwitcher />
          <NotificationsControl />
          <UserMenu />
        </div>
      </div>
    </header>
  );
}
