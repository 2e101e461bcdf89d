import { describe, expect, it } from 'vitest';
import { screen, within } from '@testing-library/react';
import { renderWithProviders } from '../../../testing/render.js';
import type { Neighbourhood } from '@linkloom/shared';
import { NeighbourhoodList } from './neighbourhood-list.js';

// wheels/truing.md is the centre. spokes.md and tools.md link to it; it links to tension.md and to tools.md;
// rims.md links to spokes.md (two steps in), tension.md links to gauges.md (two steps out).
const neighbourhood: Neighbourhood = {
  nodes: [
    { path: 'wheels/truing.md', title: 'Truing a wheel', stationaryScore: 0.05, flags: [], distance: 0 },
    { path: 'wheels/spokes.md', title: 'Spokes', stationaryScore: 0.02, flags: [], distance: 1 },
    { path: 'tools.md', title: 'Tools', stationaryScore: 0.09, flags: [], distance: 1 },
    { path: 'wheels/tension.md', title: 'Spoke tension', stationaryScore: 0.01, flags: ['deadEnd'], distance: 1 },
    { path: 'wheels/rims.md', title: 'Rims', stationaryScore: 0.004, flags: ['orphan'], distance: 2 },
    { path: 'gauges.md', title: 'Gauges', stationaryScore: 0.003, flags: [], distance: 2 },
  ],
  edges: [
    { source: 'wheels/spokes.md', target: 'wheels/truing.md' },
    { source: 'tools.md', target: 'wheels/truing.md' },
    { source: 'wheels/truing.md', target: 'wheels/tension.md' },
    { source: 'wheels/truing.md', target: 'tools.md' },
    { source: 'wheels/rims.md', target: 'wheels/spokes.md' },
    { source: 'wheels/tension.md', target: 'gauges.md' },
  ],
};

function group(name: RegExp) {
  return within(screen.getByRole('region', { name }));
}

describe('NeighbourhoodList', () => {
  it('lists the same pages as the picture, by direction, highest score first, with links to each page', async () => {
    renderWithProviders(<NeighbourhoodList docSetId="d1" runId="latest" centrePath="wheels/truing.md" neighbourhood={neighbourhood} />);
    await screen.findByText(/Pages linking here/);
    const inbound = group(/Pages linking here/)
      .getAllByRole('link')
      .map((a) => a.textContent);
    expect(inbound).toEqual(['Tools', 'Spokes']);
    const outbound = group(/Pages this page links to/)
      .getAllByRole('link')
      .map((a) => a.textContent);
    expect(outbound).toEqual(['Tools', 'Spoke tension']);
    const twoSteps = group(/Two steps away/).getAllByRole('link');
    expect(twoSteps.map((a) => a.textContent)).toEqual(['Rims', 'Gauges']);
    expect(twoSteps[0].getAttribute('href')).toBe('/doc-sets/d1/page?path=wheels%2Frims.md');
    // Findings are spelled out, since the list cannot rely on colour.
    expect(screen.getByText(/wheels\/rims\.md · score .* · Orphan/)).toBeTruthy();
    expect(screen.getByText(/wheels\/tension\.md · score .* · Dead end/)).toBeTruthy();
    // The centre page is not its own neighbour.
    expect(screen.queryByRole('link', { name: 'Truing a wheel' })).toBeNull();
  });
});
