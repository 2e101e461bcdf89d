import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { fakeFetch, renderWithProviders } from '../../../testing/render.js';
import { scheduleStatusSchema } from '@linkloom/shared';
import { parsed, signInAs } from '../../../testing/fixtures.js';
import ScheduleRoute from './schedule-route.js';

afterEach(() => vi.unstubAllGlobals());

const idle = parsed(scheduleStatusSchema, {
  nightlyTime: '02:00',
  timeZone: 'Europe/Oslo',
  nextRunAt: '2026-12-02T01:00:00Z',
  running: false,
  lastStartedAt: '2026-12-01T01:00:00Z',
  lastFinishedAt: '2026-12-01T01:04:00Z',
  lastResult: {
    trigger: 'clock',
    status: 'finished',
    docSets: [
      { docSetId: 'd1', name: 'Harbour guides', action: 're-read folder', outcome: 'finished', runId: 'r9', runNumber: 9, digestSentTo: 2 },
      { docSetId: 'd2', name: 'Ferry manuals', action: 're-analysed', outcome: 'failed', message: 'snapshot is empty' },
    ],
  },
  docSets: [
    { id: 'd1', name: 'Harbour guides', nightly: true, sourceFolder: '/srv/docs/harbour' },
    { id: 'd2', name: 'Ferry manuals', nightly: true, sourceFolder: null },
    { id: 'd3', name: 'Old drafts', nightly: false, sourceFolder: null },
  ],
});

/** The page's own "Run now" button, not the confirmation dialog's (which may still be fading out). */
const pageButton = () => screen.getAllByRole('button', { name: /Run now|Running…/ }).find((b) => !b.closest('[role="dialog"]'))!;

/** "Run now" asks first; the dialog's own button starts the job. */
async function runNow() {
  await userEvent.click(await screen.findByRole('button', { name: 'Run now' }));
  const dialog = await screen.findByRole('dialog');
  await userEvent.click(within(dialog).getByRole('button', { name: 'Run now' }));
}

describe('nightly runs screen', () => {
  it('says per run how many people its digest went to', async () => {
    signInAs('editor');
    vi.stubGlobal('fetch', fakeFetch({ 'GET /api/schedule': () => ({ body: idle }) }).fn);
    renderWithProviders(<ScheduleRoute />, { route: '/admin/schedule' });
    expect(await screen.findByText('digest sent to 2 people')).toBeTruthy();
    expect(screen.getByText('no digest: the run did not finish')).toBeTruthy();
  });

  it('asks before it runs the job, and a cancel sends nothing', async () => {
    signInAs('editor');
    const fake = fakeFetch({
      'GET /api/schedule': () => ({ body: idle }),
      'POST /api/schedule/run-now': () => ({ status: 202, body: { started: true } }),
    });
    vi.stubGlobal('fetch', fake.fn);
    renderWithProviders(<ScheduleRoute />, { route: '/admin/schedule' });
    await userEvent.click(await screen.findByRole('button', { name: 'Run now' }));
    const dialog = await screen.findByRole('dialog');
    expect(dialog.textContent).toContain('2 now');
    await userEvent.click(within(dialog).getByRole('button', { name: 'Cancel' }));
    expect(fake.calls.filter((c) => c.method === 'POST')).toHaveLength(0);
  });

  it('shows why "Run now" did not start the job', async () => {
    signInAs('editor');
    const reason = 'The nightly job is already running; it was not started twice.';
    const fake = fakeFetch({
      'GET /api/schedule': () => ({ body: idle }),
      'POST /api/schedule/run-now': () => ({ status: 202, body: { started: false, reason } }),
    });
    vi.stubGlobal('fetch', fake.fn);
    renderWithProviders(<ScheduleRoute />, { route: '/admin/schedule' });

    expect((await screen.findByRole('link', { name: 'Open findings of run 9' })).getAttribute('href')).toBe('/doc-sets/d1/findings?run=r9');
    expect(screen.getByText('snapshot is empty')).toBeTruthy();
    expect(screen.getByText('/srv/docs/harbour')).toBeTruthy();

    await runNow();
    expect((await screen.findByRole('alert')).textContent).toContain(reason);
    expect(fake.calls.filter((c) => c.method === 'POST')).toHaveLength(1);
  });

  it('follows a started job by polling until it is no longer running', async () => {
    signInAs('editor');
    let gets = 0;
    let phase: 'before' | 'running' | 'done' = 'before';
    const fake = fakeFetch({
      'GET /api/schedule': () => {
        gets++;
        if (phase === 'running' && gets >= 3) phase = 'done';
        if (phase === 'running') return { body: { ...idle, running: true, lastStartedAt: '2026-12-01T20:00:00Z', lastFinishedAt: null } };
        if (phase === 'done') return { body: { ...idle, lastStartedAt: '2026-12-01T20:00:00Z', lastFinishedAt: '2026-12-01T20:01:00Z' } };
        return { body: idle };
      },
      'POST /api/schedule/run-now': () => {
        phase = 'running';
        return { status: 202, body: { started: true } };
      },
    });
    vi.stubGlobal('fetch', fake.fn);
    renderWithProviders(<ScheduleRoute />, { route: '/admin/schedule' });
    await runNow();
    expect(await screen.findByText('Running now')).toBeTruthy();
    // The poll interval is 3 s; the job is reported done on the next poll, which frees the button.
    await vi.waitFor(() => expect(pageButton().textContent).toBe('Run now'), { timeout: 8000 });
    expect(screen.queryByText('Running now')).toBeNull();
    expect(gets).toBeGreaterThanOrEqual(3);
  }, 15_000);
});
