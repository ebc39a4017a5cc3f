import { act, cleanup, fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { OriginalSummary } from '@shared/contracts/originals';
import { forgetCsrfToken } from '../../../lib/api-client';
import { fakeApi } from '../../../testing/fake-api';
import { renderPage } from '../../../testing/render-page';
import { UploadPanel } from './upload-panel';

// Stands in for the browser's XMLHttpRequest, so a test can report upload progress by hand.
class FakeUpload {
  static last: FakeUpload | null = null;
  upload: { onprogress: ((event: { lengthComputable: boolean; loaded: number; total: number }) => void) | null } = { onprogress: null };
  headers: Record<string, string> = {};
  body: FormData | null = null;
  status = 0;
  responseText = '';
  withCredentials = false;
  onload: (() => void) | null = null;
  onerror: (() => void) | null = null;
  onabort: (() => void) | null = null;
  onloadend: (() => void) | null = null;
  url = '';
  constructor() {
    FakeUpload.last = this;
  }
  open(_method: string, url: string) {
    this.url = url;
  }
  setRequestHeader(name: string, value: string) {
    this.headers[name] = value;
  }
  send(body: FormData) {
    this.body = body;
  }
  abort() {
    this.onabort?.();
  }
  answer(status: number, body: unknown) {
    this.status = status;
    this.responseText = JSON.stringify(body);
    this.onload?.();
    this.onloadend?.();
  }
}

const puffinPicnic: OriginalSummary = {
  id: '3a0eeb66-4989-41a1-b8db-5b05d884a0bd',
  name: 'puffin-picnic.psd',
  fileKind: 'psd',
  byteSize: 1498945,
  status: 'ready',
  phase: 'done',
  percent: 100,
  cut: 'groups',
  width: 1500,
  height: 2100,
  layerCount: 40,
  motifCount: 10,
  error: null,
  previousOriginalId: null,
  uploadedBy: null,
  createdAt: '2026-03-01T10:00:00Z',
  importedAt: '2026-03-01T10:00:05Z',
};

beforeEach(() => {
  forgetCsrfToken();
  FakeUpload.last = null;
  vi.stubGlobal('XMLHttpRequest', FakeUpload);
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const chooseFile = (file: File) => {
  const input = document.querySelector<HTMLInputElement>('input[type=file]') as HTMLInputElement;
  fireEvent.change(input, { target: { files: [file] } });
};

describe('uploading an original', () => {
  it('shows the bytes sent as a progress bar, then hands on the new original', async () => {
    fakeApi({ 'GET /api/auth/csrf': { body: { csrfToken: 'token-1' } } });
    const onUploaded = vi.fn();
    renderPage(<UploadPanel originals={[]} onUploaded={onUploaded} />);
    chooseFile(new File([new Uint8Array(2048)], 'lantern-walk.psd'));
    fireEvent.click(screen.getByRole('radio', { name: 'One motif per layer' }));
    fireEvent.click(screen.getByRole('button', { name: 'Upload and import' }));

    await waitFor(() => expect(FakeUpload.last?.body).toBeTruthy());
    const request = FakeUpload.last as FakeUpload;
    expect(request.url).toBe('/api/originals');
    expect(request.headers['x-csrf-token']).toBe('token-1');
    expect(request.body?.get('cut')).toBe('layers');
    expect((request.body?.get('file') as File).name).toBe('lantern-walk.psd');

    act(() => request.upload.onprogress?.({ lengthComputable: true, loaded: 1024, total: 2048 }));
    const bar = screen.getByRole('progressbar', { name: 'Uploading lantern-walk.psd' });
    expect(bar.getAttribute('aria-valuenow')).toBe('50');
    expect(screen.getByText(/1\.0 KB of 2\.0 KB/)).toBeTruthy();

    act(() => request.answer(202, { id: 'b6d5b0de-7a3f-4c55-9d2e-0c4a43d1a001', status: 'queued' }));
    await waitFor(() => expect(onUploaded).toHaveBeenCalledWith('b6d5b0de-7a3f-4c55-9d2e-0c4a43d1a001'));
  });

  it("offers an earlier original of the same name as the one this file is a new version of", async () => {
    fakeApi({ 'GET /api/auth/csrf': { body: { csrfToken: 'token-1' } } });
    renderPage(<UploadPanel originals={[puffinPicnic]} onUploaded={vi.fn()} />);
    chooseFile(new File(['8BPS'], 'puffin-picnic.psd'));
    fireEvent.click(screen.getByRole('button', { name: 'Upload as its new version' }));
    const select = screen.getByRole('combobox', { name: /new version of an earlier original/ }) as HTMLSelectElement;
    expect(select.value).toBe(puffinPicnic.id);

    fireEvent.click(screen.getByRole('button', { name: 'Upload and import' }));
    await waitFor(() => expect(FakeUpload.last?.body?.get('previousOriginalId')).toBe(puffinPicnic.id));
  });

  it("shows the server's reason when it refuses the file", async () => {
    fakeApi({ 'GET /api/auth/csrf': { body: { csrfToken: 'token-1' } } });
    renderPage(<UploadPanel originals={[]} onUploaded={vi.fn()} />);
    chooseFile(new File(['GIF89a'], 'kite.png'));
    fireEvent.click(screen.getByRole('button', { name: 'Upload and import' }));
    await waitFor(() => expect(FakeUpload.last?.body).toBeTruthy());
    act(() =>
      FakeUpload.last?.answer(415, { error: { code: 'upload.unsupported_type', message: 'This file is a GIF image, not a PSD, PNG, JPEG or WebP.' } }),
    );
    expect((await screen.findByRole('alert')).textContent).toContain('This file is a GIF image');
    expect(screen.getByRole('button', { name: 'Try the upload again' })).toBeTruthy();
  });
});
