import { act, cleanup, fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { forgetCsrfToken } from '../../../lib/api-client';
import { fakeApi } from '../../../testing/fake-api';
import { renderPage } from '../../../testing/render-page';
import { SamplePhotoUpload } from './sample-photo-upload';

// Stands in for XMLHttpRequest so the test reports upload progress by hand.
class FakeUpload {
  static all: FakeUpload[] = [];
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
    FakeUpload.all.push(this);
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

const sampleId = '7c1d2e3f-4a5b-4c6d-8e9f-0a1b2c3d4e5f';
const photo = (name: string) => ({
  id: 'photo-1', sampleId, fileName: name, contentType: 'image/jpeg', byteSize: 2048, width: 300, height: 600,
  thumbUrl: '/t', displayUrl: '/d', originalUrl: '/o', createdAt: '2026-02-11T10:00:00.000Z',
});

beforeEach(() => {
  forgetCsrfToken();
  FakeUpload.all = [];
  vi.stubGlobal('XMLHttpRequest', FakeUpload);
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const dropFiles = (files: File[]) => {
  const zone = screen.getByTestId('sample-photo-drop');
  fireEvent.drop(zone, { dataTransfer: { files, types: ['Files'] } });
};

describe('adding photos of a sample', () => {
  it('sends dropped photos one at a time with a byte count, and reports the server’s refusal by name', async () => {
    fakeApi({ 'GET /api/auth/csrf': { body: { csrfToken: 'token-1' } } });
    renderPage(<SamplePhotoUpload sampleId={sampleId} productId="p-1" limitBytes={40 * 1024 * 1024} />);
    dropFiles([new File([new Uint8Array(2048)], 'mug-front.jpg', { type: 'image/jpeg' }), new File([new Uint8Array(1024)], 'IMG_0001.HEIC', { type: 'image/heic' })]);

    await waitFor(() => expect(FakeUpload.all[0]?.body).toBeTruthy());
    const first = FakeUpload.all[0];
    expect(first.url).toBe(`/api/samples/${sampleId}/photos`);
    expect((first.body?.get('file') as File).name).toBe('mug-front.jpg');
    act(() => first.upload.onprogress?.({ lengthComputable: true, loaded: 1024, total: 2048 }));
    expect(screen.getByRole('progressbar', { name: 'Uploading mug-front.jpg' }).getAttribute('aria-valuenow')).toBe('50');
    expect(screen.getByText(/1 KB of 2 KB/)).toBeTruthy();
    act(() => first.answer(201, photo('mug-front.jpg')));

    await waitFor(() => expect(FakeUpload.all[1]?.body).toBeTruthy());
    act(() => FakeUpload.all[1].answer(415, { error: { code: 'photo.heic_unsupported', message: 'This server cannot read HEIC photos yet. Export the photo as JPEG.' } }));
    expect(await screen.findByText(/IMG_0001\.HEIC: This server cannot read HEIC photos yet/)).toBeTruthy();
    expect(screen.queryByRole('progressbar')).toBeNull();
  });

  it('refuses a photo over the limit before sending any byte', async () => {
    fakeApi({});
    renderPage(<SamplePhotoUpload sampleId={sampleId} productId="p-1" limitBytes={1024} />);
    dropFiles([new File([new Uint8Array(4096)], 'huge.jpg', { type: 'image/jpeg' })]);
    expect(await screen.findByText(/huge\.jpg is 4 KB; photos may be up to 1 KB/)).toBeTruthy();
    expect(FakeUpload.all).toHaveLength(0);
  });
});
