import type { ShouldRevalidateFunctionArgs } from 'react-router-dom';

// Typing a search or ticking a filter changes only the address's query; the page fetches
// those results itself (keeping the previous ones on screen), so the loader need not run.
// Apart from the loader, so the router's table can hold it without the loader's fetchers.
export const libraryShouldRevalidate = ({ currentUrl, nextUrl, defaultShouldRevalidate }: ShouldRevalidateFunctionArgs) =>
  currentUrl.pathname === nextUrl.pathname ? false : defaultShouldRevalidate;
