import { useState } from 'react';
import { Box, Button } from '@mui/material';
import AddOutlined from '@mui/icons-material/AddOutlined';
import { PageHeader } from '../../../components/ui/page-header.js';
import { EmptyState } from '../../../components/ui/empty-state.js';
import { ErrorPanel } from '../../../components/ui/error-panel.js';
import { LoadingSkeleton } from '../../../components/ui/loading-skeleton.js';
import { useRoleAtLeast } from '../../../lib/use-role.js';
import { useDocSets } from '../api/get-doc-sets.js';
import { DocSetCard } from '../components/doc-set-card.js';
import { CreateDocSetDialog } from '../components/create-doc-set-dialog.js';
import { MyOpenTasks } from '../../tasks/index.js';

export default function DocSetsRoute() {
  const docSets = useDocSets();
  const canCreate = useRoleAtLeast('editor');
  const doesFixes = useRoleAtLeast('writer');
  const [creating, setCreating] = useState(false);
  const newButton = canCreate && (
    <Button variant="contained" startIcon={<AddOutlined />} onClick={() => setCreating(true)}>
      New doc set
    </Button>
  );
  return (
    <>
      {/* People who fix pages see their open work first; editors only when they have some. */}
      {doesFixes && <MyOpenTasks hideWhenEmpty={canCreate} />}
      <PageHeader
        title="Doc sets"
        subtitle="Each doc set is one body of Markdown documentation, analysed after every upload."
        actions={newButton}
      />
      {docSets.isLoading && <LoadingSkeleton variant="cards" count={3} />}
      {docSets.isError && <ErrorPanel error={docSets.error} onRetry={() => docSets.refetch()} />}
      {docSets.data?.length === 0 && (
        <EmptyState
          title="No doc sets yet"
          hint={
            canCreate
              ? 'Create one, then upload a zip of your Markdown to see its links and page scores.'
              : 'An editor or admin needs to create the first doc set.'
          }
          action={newButton}
        />
      )}
      {docSets.data && docSets.data.length > 0 && (
        <Box sx={{ display: 'grid', gap: 2, gridTemplateColumns: 'repeat(auto-fill, minmax(360px, 1fr))' }}>
          {docSets.data.map((docSet) => (
            <DocSetCard key={docSet.id} docSet={docSet} />
          ))}
        </Box>
      )}
      {canCreate && <CreateDocSetDialog open={creating} onClose={() => setCreating(false)} />}
    </>
  );
}
