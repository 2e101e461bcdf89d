import { Box } from '@mui/material';
import { useNavigate } from 'react-router';
import { StatCard } from '../../../components/ui/stat-card.js';
import type { Run } from '@linkloom/shared';
import { HEADLINES } from './overview-model.js';

/** Where a headline count leads: the findings view listing those pages or links. */
const FINDINGS_VIEW: Partial<Record<string, string>> = {
  brokenLinks: 'broken-links',
  brokenAnchors: 'broken-anchors',
  orphans: 'orphans',
  deadEnds: 'dead-ends',
  unreachable: 'unreachable',
  deepPages: 'deep-pages',
  islands: 'islands',
};

export function HeadlineStats({
  docSetId,
  latest,
  previous,
  loading,
}: {
  docSetId: string;
  latest: Run | null;
  previous: Run | null;
  loading: boolean;
}) {
  const navigate = useNavigate();
  return (
    <Box sx={{ display: 'grid', gap: 2, gridTemplateColumns: 'repeat(auto-fill, minmax(190px, 1fr))' }}>
      {HEADLINES.map((h) => {
        const view = FINDINGS_VIEW[h.key];
        const base = `/doc-sets/${encodeURIComponent(docSetId)}`;
        return (
          <StatCard
            key={h.key}
            label={h.label}
            value={latest?.counts?.[h.key]}
            previous={previous?.counts?.[h.key] ?? null}
            upIs={h.upIs}
            hint={h.hint}
            loading={loading}
            onClick={latest ? () => navigate(view ? `${base}/findings/${view}` : `${base}/pages`) : undefined}
          />
        );
      })}
    </Box>
  );
}
