import { afterEach, describe, expect, it, vi } from 'vitest';
import { act, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { fakeFetch, renderWithProviders } from '../../../testing/render.js';
import { signInAs, snapshot } from '../../../testing/fixtures.js';
import { UploadArchiveDialog } from './upload-archive-dialog.js';

/** Stands in for XMLHttpRequest so the test can drive upload progress by hand. */
class FakeXhr {
  static last: FakeXhr | null = null;
  upload: { onprogress: ((e: { lengthComputable: boolean; loaded: number; total: number }) => void) | null } = { onprogress: null };
  onload: (() => void) | null = null;
  onerror: (() => void) | null = null;
  status = 0;
  responseText = '';
  headers: Record<string, string> = {};
  url = '';
  body: FormData | null = null;
  open(_method: string, url: string) {
    this.url = url;
  }
  setRequestHeader(name: string, value: string) {
    this.headers[name] = value;
  }
  send(body: FormData) {
    this.body = body;
    FakeXhr.last = this;
  }
}

afterEach(() => vi.unstubAllGlobals());

describe('upload archive', () => {
  it('shows real upload progress, then import progress, then the import report', async () => {
    signInAs('editor');
    vi.stubGlobal('XMLHttpRequest', FakeXhr);
    let shown = snapshot('s1', { status: 'importing', progress: { done: 3, total: 12 } });
    vi.stubGlobal('fetch', fakeFetch({ 'GET /api/doc-sets/d1/snapshots/s1': () => ({ body: shown }) }).fn);
    renderWithProviders(<UploadArchiveDialog docSetId="d1" open onClose={() => undefined} />);

    const file = new File(['PK'], 'handbook.zip', { type: 'application/zip' });
    await userEvent.upload(screen.getByTestId('archive-input'), file);
    const xhr = FakeXhr.last!;
    expect(xhr.url).toBe('/api/doc-sets/d1/snapshots');
    expect(xhr.headers.Authorization).toBe('Bearer test-token');
    expect((xhr.body!.get('archive') as File).name).toBe('handbook.zip');

    act(() => xhr.upload.onprogress!({ lengthComputable: true, loaded: 40, total: 100 }));
    expect(screen.getByText('Uploading… 40%')).toBeTruthy();

    xhr.status = 202;
    xhr.responseText = JSON.stringify({ snapshot: shown });
    act(() => xhr.onload!());
    expect(await screen.findByText('Importing… 3 of 12 files')).toBeTruthy();

    shown = {
      ...shown,
      status: 'ready',
      progress: { done: 12, total: 12 },
      pageCount: 10,
      linkCount: 31,
      assetCount: 2,
      warnings: [{ path: 'guide/odd.md', code: 'FRONT_MATTER_INVALID', message: 'Front matter is not valid YAML' }],
    };
    expect(await screen.findByText(/Imported 10 pages, 31 links and 2 other files/, undefined, { timeout: 4000 })).toBeTruthy();
    expect(screen.getByText('guide/odd.md')).toBeTruthy();
  });

  it('refuses a file that is not a zip before uploading', async () => {
    signInAs('editor');
    FakeXhr.last = null;
    vi.stubGlobal('XMLHttpRequest', FakeXhr);
    renderWithProviders(<UploadArchiveDialog docSetId="d1" open onClose={() => undefined} />);
    await userEvent.upload(screen.getByTestId('archive-input'), new File(['x'], 'notes.tar.gz'), { applyAccept: false });
    expect(screen.getByText(/Linkloom reads .zip archives/)).toBeTruthy();
    expect(FakeXhr.last).toBeNull();
  });
});
