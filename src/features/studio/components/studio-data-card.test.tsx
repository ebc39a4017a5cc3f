// @vitest-environment happy-dom
import { cleanup, fireEvent, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { apiError, fakeApi } from '../../../testing/fake-api';
import { renderPage } from '../../../testing/render-page';
import { StudioDataCard } from './studio-data-card';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const pick = (content: string, name = 'saltmarsh-studio-data.json') => {
  const input = screen.getByLabelText('Import into this empty studio') as HTMLInputElement;
  fireEvent.change(input, { target: { files: [new File([content], name, { type: 'application/json' })] } });
};

describe('keeping the studio\'s data on the settings page', () => {
  it('offers the export as a download', () => {
    renderPage(<StudioDataCard />);
    expect(screen.getByRole('link', { name: 'Download studio data' }).getAttribute('href')).toBe('/api/studio/data-export');
  });

  it('says when the chosen file is not JSON, without sending it', async () => {
    const { calls } = fakeApi({});
    renderPage(<StudioDataCard />);
    pick('not json at all', 'notes.txt');
    expect(await screen.findByText(/“notes.txt” is not a studio data file/)).toBeTruthy();
    expect(calls.filter((c) => c.path.includes('data-import'))).toEqual([]);
  });

  it('imports the file and shows the report, naming the people it could not match', async () => {
    fakeApi({
      'GET /api/auth/csrf': { body: { csrfToken: 't' } },
      'POST /api/studio/data-import': {
        body: {
          imported: { motifs: 18, products: 16, salesRows: 0 },
          matchedPeople: [{ email: 'ines@saltmarsh.test', name: 'Ines Okafor' }],
          unmatchedPeople: [{ email: 'june@saltmarsh.test', name: 'June Abara' }],
          objectsCopied: 57,
          missingObjects: [],
          notes: ['The studio keeps its own name.'],
        },
      },
    });
    renderPage(<StudioDataCard />);
    pick(JSON.stringify({ format: 'motifold.studio-data' }));
    expect(await screen.findByText("The studio's data was imported")).toBeTruthy();
    expect(screen.getByText('Records: 18 motifs, 16 products.')).toBeTruthy();
    expect(screen.getByText(/June Abara \(june@saltmarsh.test\)/)).toBeTruthy();
  });

  it('shows the server\'s refusal in its own words', async () => {
    fakeApi({
      'GET /api/auth/csrf': { body: { csrfToken: 't' } },
      'POST /api/studio/data-import': apiError(409, 'studio.not_empty', 'This studio already has originals, motifs, products or collections.'),
    });
    renderPage(<StudioDataCard />);
    pick('{}');
    expect(await screen.findByText('This studio already has originals, motifs, products or collections.')).toBeTruthy();
  });
});
