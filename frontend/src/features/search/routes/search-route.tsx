import { useEffect, useState, type FormEvent } from 'react';
import { useParams } from 'react-router';
import { Button, Paper, Stack, TextField, Typography } from '@mui/material';
import SearchOutlined from '@mui/icons-material/SearchOutlined';
import { PageHeader } from '../../../components/ui/page-header.js';
import { EmptyState } from '../../../components/ui/empty-state.js';
import { LoadingSkeleton } from '../../../components/ui/loading-skeleton.js';
import { useUrlState } from '../../../components/ui/use-url-state.js';
import { AnalysisError } from '../../pages/components/analysis-error.js';
import { useSearchPages } from '../api/search-pages.js';
import { SearchModeToggle } from '../components/search-mode-toggle.js';
import { SearchResults } from '../components/search-results.js';
import type { SearchMode } from '@linkloom/shared';

export default function SearchRoute() {
  const { docSetId = '' } = useParams();
  const [state, setState] = useUrlState({ q: '', mode: 'blend', run: 'latest' });
  const mode: SearchMode = state.mode === 'subgraph' ? 'subgraph' : 'blend';
  const runId = state.run || 'latest';
  const [text, setText] = useState(state.q);
  useEffect(() => setText(state.q), [state.q]);
  const results = useSearchPages(docSetId, runId, state.q, mode);
  const submit = (event: FormEvent) => {
    event.preventDefault();
    setState({ q: text.trim() });
  };

  return (
    <>
      <PageHeader title="Search" subtitle="Find pages by their words, ranked with help from the link graph." />
      <Paper variant="outlined" sx={{ p: 2, mb: 3 }}>
        <Stack spacing={2}>
          <Stack component="form" role="search" onSubmit={submit} direction="row" spacing={1}>
            <TextField
              size="small"
              label="Words to find"
              value={text}
              onChange={(e) => setText(e.target.value)}
              sx={{ flex: 1, maxWidth: 640 }}
              autoFocus
            />
            <Button type="submit" variant="contained" startIcon={<SearchOutlined />}>
              Search
            </Button>
          </Stack>
          <SearchModeToggle mode={mode} onChange={(m) => setState({ mode: m })} />
        </Stack>
      </Paper>
      {!state.q ? (
        <EmptyState title="Type some words and press Enter" hint="Search looks in page titles and text of the latest analysis." />
      ) : results.isLoading ? (
        <LoadingSkeleton count={6} />
      ) : results.error ? (
        <AnalysisError docSetId={docSetId} error={results.error} onRetry={() => results.refetch()} />
      ) : results.data && results.data.items.length === 0 ? (
        <EmptyState title={`No page mentions "${state.q}"`} hint="Try fewer or different words, or check the spelling." />
      ) : (
        results.data && (
          <Stack spacing={1} aria-busy={results.isFetching ? 'true' : 'false'}>
            <Typography variant="body2" color="text.secondary">
              {results.data.total} page{results.data.total === 1 ? '' : 's'} found. {results.data.explanation}
            </Typography>
            <SearchResults hits={results.data.items} docSetId={docSetId} runId={runId} />
          </Stack>
        )
      )}
    </>
  );
}
