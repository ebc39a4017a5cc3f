import { useEffect, useRef } from 'react';
import { useLocation } from 'react-router-dom';

// A client-side navigation leaves focus on the link that was clicked; move it to the new
// page's heading so screen readers announce the page, as a full page load would. The first
// load is left to the browser.
export function RouteFocus() {
  const { pathname } = useLocation();
  const previous = useRef<string | null>(null);

  useEffect(() => {
    if (previous.current !== null && previous.current !== pathname) {
      const heading = document.querySelector<HTMLElement>('[data-page-heading]');
      const target = heading ?? document.getElementById('main');
      target?.focus({ preventScroll: true });
    }
    previous.current = pathname;
  }, [pathname]);

  return null;
}
