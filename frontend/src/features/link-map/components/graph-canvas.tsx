// The one place cytoscape is imported; only the page-detail and link-map screens (lazy routes) use it,
// so the library stays in its own chunk (see vite.config.ts) and out of the first load.
import { useEffect, useRef } from 'react';
import cytoscape, { type Core, type ElementDefinition, type LayoutOptions, type StylesheetJson } from 'cytoscape';
import { Box, IconButton, Paper, Stack, Tooltip } from '@mui/material';
import ZoomInOutlined from '@mui/icons-material/ZoomInOutlined';
import ZoomOutOutlined from '@mui/icons-material/ZoomOutOutlined';
import CenterFocusStrongOutlined from '@mui/icons-material/CenterFocusStrongOutlined';

export interface GraphCanvasProps {
  /** Nodes need data `id`, `label`, `size`, `colour`; edges `source`, `target` and optionally `width`. */
  elements: ElementDefinition[];
  layout: LayoutOptions;
  onNodeOpen: (id: string) => void;
  /** A node to pick out and centre (the search box of the link map). */
  highlightId?: string | null;
  height?: number;
  label: string;
}

const STYLE: StylesheetJson = [
  {
    selector: 'node',
    style: {
      width: 'data(size)',
      height: 'data(size)',
      'background-color': 'data(colour)',
      label: 'data(label)',
      'font-size': 11,
      color: '#1C2629',
      'text-valign': 'bottom',
      'text-margin-y': 4,
      'text-wrap': 'ellipsis',
      'text-max-width': '140px',
      'border-width': 1,
      'border-color': '#FFFFFF',
      'min-zoomed-font-size': 7,
    },
  },
  {
    selector: 'edge',
    style: {
      width: 'data(width)',
      'line-color': '#9FB5BA',
      'target-arrow-color': '#9FB5BA',
      'target-arrow-shape': 'triangle',
      'curve-style': 'bezier',
      'arrow-scale': 0.8,
      opacity: 0.8,
    },
  },
  { selector: 'node.highlight', style: { 'border-width': 4, 'border-color': '#E8893A', 'z-index': 10 } },
  { selector: 'node:active', style: { 'overlay-opacity': 0.15 } },
];

function zoomBy(cy: Core, factor: number): void {
  cy.zoom({ level: cy.zoom() * factor, renderedPosition: { x: cy.width() / 2, y: cy.height() / 2 } });
}

/** An interactive graph: drag to pan, wheel or buttons to zoom, click (tap) a node to open it. */
export function GraphCanvas({ elements, layout, onNodeOpen, highlightId, height = 480, label }: GraphCanvasProps) {
  const container = useRef<HTMLDivElement>(null);
  const cyRef = useRef<Core | null>(null);
  const openRef = useRef(onNodeOpen);
  openRef.current = onNodeOpen;

  useEffect(() => {
    if (!container.current) return undefined;
    const cy = cytoscape({
      container: container.current,
      elements,
      style: STYLE,
      layout,
      minZoom: 0.1,
      maxZoom: 4,
      wheelSensitivity: 0.3,
      boxSelectionEnabled: false,
    });
    cy.on('tap', 'node', (event) => openRef.current(String(event.target.id())));
    cyRef.current = cy;
    return () => {
      cy.destroy();
      cyRef.current = null;
    };
  }, [elements, layout]);

  useEffect(() => {
    const cy = cyRef.current;
    if (!cy) return;
    cy.nodes().removeClass('highlight');
    if (!highlightId) return;
    const node = cy.getElementById(highlightId);
    if (node.nonempty()) {
      node.addClass('highlight');
      cy.animate({ center: { eles: node }, zoom: Math.max(cy.zoom(), 1.2) }, { duration: 300 });
    }
  }, [highlightId, elements]);

  const act = (fn: (cy: Core) => void) => () => cyRef.current && fn(cyRef.current);
  return (
    <Paper variant="outlined" sx={{ position: 'relative', overflow: 'hidden' }}>
      <Box ref={container} role="img" aria-label={label} sx={{ height, width: '100%', bgcolor: 'background.default' }} />
      <Stack sx={{ position: 'absolute', top: 8, right: 8, bgcolor: 'background.paper', borderRadius: 1, boxShadow: 1 }}>
        <Tooltip title="Zoom in" placement="left">
          <IconButton aria-label="Zoom in" size="small" onClick={act((cy) => zoomBy(cy, 1.25))}>
            <ZoomInOutlined fontSize="small" />
          </IconButton>
        </Tooltip>
        <Tooltip title="Zoom out" placement="left">
          <IconButton aria-label="Zoom out" size="small" onClick={act((cy) => zoomBy(cy, 0.8))}>
            <ZoomOutOutlined fontSize="small" />
          </IconButton>
        </Tooltip>
        <Tooltip title="Fit the whole picture" placement="left">
          <IconButton aria-label="Fit the whole picture" size="small" onClick={act((cy) => cy.fit(undefined, 24))}>
            <CenterFocusStrongOutlined fontSize="small" />
          </IconButton>
        </Tooltip>
      </Stack>
    </Paper>
  );
}
