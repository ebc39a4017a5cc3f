// @vitest-environment happy-dom
import { cleanup, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { CalendarResponse } from '@shared/contracts/calendar';
import { fakeApi } from '../../../testing/fake-api';
import { renderPage } from '../../../testing/render-page';
import { CalendarPage } from './calendar-page';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const spring: CalendarResponse['collections'][number] = {
  id: 'c-spring',
  name: 'Coastal Spring',
  seasonStart: '2027-03-01',
  seasonEnd: '2027-05-31',
  launchDate: '2027-03-15',
  readyBy: '2027-01-18',
  lateCount: 1,
  atRiskCount: 0,
  products: [
    { id: 'p-mug', name: 'Puffin Picnic mug', stage: 'sampling', templateId: 'mug-11oz', flag: 'late', daysUntilReadyBy: -3 },
    { id: 'p-tote', name: 'Puffin Picnic tote', stage: 'ready', templateId: 'tote', flag: 'ready', daysUntilReadyBy: -3 },
  ],
};

const answer = (from: string, to: string, collections = [spring]): CalendarResponse => ({
  today: '2027-01-21', from, to, readyWeeksBeforeLaunch: 8, atRiskDays: 14, collections, undated: [{ id: 'c-x', name: 'Someday Shells', productCount: 0 }],
});

describe('the season calendar page', () => {
  it('shows the month with launch and ready-by days in words, and late products flagged in words', async () => {
    fakeApi({
      'GET /api/calendar?from=2027-03-01&to=2027-03-31': { body: answer('2027-03-01', '2027-03-31') },
      'GET /api/calendar?from=2027-04-01&to=2027-04-30': { body: answer('2027-04-01', '2027-04-30', []) },
    });
    const { router } = renderPage(<CalendarPage />, { path: '/calendar', url: '/calendar?month=2027-03' });
    expect(await screen.findByText('March 2027')).toBeTruthy();
    const grid = screen.getByRole('table');
    expect(within(grid).getByText('Launch: Coastal Spring')).toBeTruthy();
    expect(within(grid).getByText('Season starts: Coastal Spring')).toBeTruthy();
    expect(screen.getByText('Late: 3 days past its ready-by date')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Puffin Picnic mug' }).getAttribute('href')).toBe('/products/p-mug');
    expect(screen.getByText(/Without dates.*Someday Shells/)).toBeTruthy();

    fireEvent.keyDown(document.body, { key: 'PageDown' });
    await waitFor(() => expect(router.state.location.search).toContain('month=2027-04'));
    expect(await screen.findByText('April 2027')).toBeTruthy();
    expect(await screen.findByText('No collection has dates here')).toBeTruthy();
  });

  it('switches to the timeline with V and marks launch and ready-by on the bar', async () => {
    fakeApi({
      'GET /api/calendar?from=2027-01-01&to=2027-01-31': { body: answer('2027-01-01', '2027-01-31') },
      'GET /api/calendar?from=2027-01-01&to=2027-12-31': { body: answer('2027-01-01', '2027-12-31') },
    });
    const { router } = renderPage(<CalendarPage />, { path: '/calendar', url: '/calendar?month=2027-01' });
    await screen.findByText('January 2027');
    expect(within(screen.getByRole('table')).getByText('Ready by: Coastal Spring (1 late)')).toBeTruthy();
    fireEvent.keyDown(document.body, { key: 'v' });
    await waitFor(() => expect(router.state.location.search).toContain('view=timeline'));
    expect(await screen.findByText('January 2027 – December 2027')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Timeline', pressed: true })).toBeTruthy();
    expect(screen.getByText(/Season Mar 1, 2027 to May 31, 2027\. Launch Mar 15, 2027\. Ready by Jan 18, 2027\./)).toBeTruthy();
  });
});
