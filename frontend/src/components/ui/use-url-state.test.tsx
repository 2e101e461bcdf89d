import { describe, expect, it } from 'vitest';
import { act, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { renderWithProviders } from '../../testing/render.js';
import { useUrlState } from './use-url-state.js';

function Probe() {
  const [state, setState] = useUrlState({ page: 1, sort: '-stationaryScore', flags: [] as string[], q: '', broken: false });
  return (
    <div>
      <output aria-label="state">{JSON.stringify(state)}</output>
      <button onClick={() => setState({ q: 'install', flags: ['orphan', 'deep'] })}>filter</button>
      <button onClick={() => setState({ page: 3 })}>page 3</button>
      <button onClick={() => setState({ sort: '-stationaryScore' })}>default sort</button>
    </div>
  );
}

const readState = () => JSON.parse(screen.getByLabelText('state').textContent ?? '{}');

describe('useUrlState', () => {
  it('reads typed values from the URL and falls back to defaults', () => {
    renderWithProviders(<Probe />, { route: '/x?page=2&flags=orphan,dead-end&broken=true&q=setup&other=keep' });
    expect(readState()).toEqual({ page: 2, sort: '-stationaryScore', flags: ['orphan', 'dead-end'], q: 'setup', broken: true });
  });

  it('ignores an unreadable number instead of breaking the view', () => {
    renderWithProviders(<Probe />, { route: '/x?page=abc' });
    expect(readState().page).toBe(1);
  });

  it('writes changes to the URL, resets paging on a filter change and keeps unrelated params', async () => {
    const user = userEvent.setup();
    const { router } = renderWithProviders(<Probe />, { route: '/x?page=4&path=guide/a.md' });
    await user.click(screen.getByText('filter'));
    const params = new URLSearchParams(router.state.location.search);
    expect(params.get('q')).toBe('install');
    expect(params.get('flags')).toBe('orphan,deep');
    expect(params.get('page')).toBeNull(); // back to page 1, the default, so left out
    expect(params.get('path')).toBe('guide/a.md');
    expect(readState().flags).toEqual(['orphan', 'deep']);
  });

  it('sets the page alone without a reset, and drops values equal to their default', async () => {
    const user = userEvent.setup();
    const { router } = renderWithProviders(<Probe />, { route: '/x?sort=title' });
    await user.click(screen.getByText('page 3'));
    expect(new URLSearchParams(router.state.location.search).get('page')).toBe('3');
    await user.click(screen.getByText('default sort'));
    const params = new URLSearchParams(router.state.location.search);
    expect(params.get('sort')).toBeNull();
    expect(params.get('page')).toBeNull();
  });

  it('follows back/forward navigation', async () => {
    const user = userEvent.setup();
    const { router } = renderWithProviders(<Probe />, { route: '/x' });
    await user.click(screen.getByText('page 3'));
    expect(readState().page).toBe(3);
    await act(() => router.navigate(-1));
    expect(readState().page).toBe(1);
  });
});
