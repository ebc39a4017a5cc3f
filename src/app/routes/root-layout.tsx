import { Outlet, ScrollRestoration } from 'react-router-dom';
import { NavigationProgress } from '../layout/navigation-progress';
import { RouteFocus } from '../layout/route-focus';
import { SkipLink } from '../layout/skip-link';

export function RootLayout() {
  return (
    <>
      <SkipLink />
      <NavigationProgress />
      <RouteFocus />
      <ScrollRestoration />
      <Outlet />
    </>
  );
}
