import { useEffect, useState } from 'react';
import { useNavigate, useParams } from 'react-router';
import { Alert, Box, Button, Stack } from '@mui/material';
import { defaultDocSetSettings } from '@linkloom/shared';
import { PageHeader } from '../../../components/ui/page-header.js';
import { ErrorPanel } from '../../../components/ui/error-panel.js';
import { LoadingSkeleton } from '../../../components/ui/loading-skeleton.js';
import { useNotifier } from '../../../components/ui/notifier.js';
import { errorMessage } from '../../../lib/api-client.js';
import { useRoleAtLeast } from '../../../lib/use-role.js';
import { useDocSet } from '../api/get-doc-set.js';
import { useUpdateDocSet } from '../api/update-doc-set.js';
import { useCreateRun } from '../../runs/api/create-run.js';
import { fromForm, toForm, type FieldErrors, type SettingsForm } from '../components/settings/settings-form-model.js';
import { FilesSection, LinksSection, PruningSection, ScoringSection } from '../components/settings/settings-sections.js';
import { ApiTokensSection } from '../components/settings/api-tokens-section.js';

export default function SettingsRoute() {
  const { docSetId = '' } = useParams();
  const docSet = useDocSet(docSetId);
  const update = useUpdateDocSet(docSetId);
  const createRun = useCreateRun(docSetId);
  const canEdit = useRoleAtLeast('editor');
  const canManageTokens = useRoleAtLeast('admin');
  const { notify } = useNotifier();
  const navigate = useNavigate();
  const [form, setForm] = useState<SettingsForm | null>(null);
  const [errors, setErrors] = useState<FieldErrors>({});

  useEffect(() => {
    // Missing keys (an older doc set) take the shared defaults so every field has a value.
    if (docSet.data && !form) setForm(toForm({ ...defaultDocSetSettings(), ...docSet.data.settings }));
  }, [docSet.data, form]);

  if (docSet.isError) return <ErrorPanel error={docSet.error} onRetry={() => docSet.refetch()} />;
  if (!form) return <LoadingSkeleton count={10} />;

  const set = (patch: Partial<SettingsForm>) => setForm((f) => (f ? { ...f, ...patch } : f));
  const save = (reanalyse: boolean) => {
    const { settings, errors: found } = fromForm(form);
    setErrors(found);
    if (!settings) return notify('Some settings need fixing; see the marked fields.', 'warning');
    update.mutate(
      { settings },
      {
        onSuccess: () => {
          if (!reanalyse) return notify('Settings saved');
          createRun.mutate(undefined, {
            onSuccess: () => {
              notify('Saved; a new analysis is running');
              navigate(`/doc-sets/${encodeURIComponent(docSetId)}/runs`);
            },
            onError: (error) => notify(`Saved, but the analysis did not start: ${errorMessage(error)}`, 'error'),
          });
        },
        onError: (error) => notify(errorMessage(error), 'error'),
      },
    );
  };
  const fieldProps = { form, errors, set, readOnly: !canEdit };
  const busy = update.isPending || createRun.isPending;
  const hasErrors = Object.keys(errors).length > 0;

  return (
    <Box sx={{ maxWidth: 900 }}>
      <PageHeader
        title="Settings"
        subtitle={docSet.data?.name}
        actions={
          canEdit && (
            <>
              <Button variant="outlined" onClick={() => save(false)} disabled={busy}>
                Save
              </Button>
              <Button variant="contained" onClick={() => save(true)} disabled={busy}>
                Save and re-analyse
              </Button>
            </>
          )
        }
      />
      <Stack spacing={3}>
        {!canEdit && <Alert severity="info">You can read these settings; an editor or admin can change them.</Alert>}
        {hasErrors && <Alert severity="error">Some settings need fixing before they can be saved.</Alert>}
        <ScoringSection {...fieldProps} />
        <LinksSection {...fieldProps} />
        <FilesSection {...fieldProps} />
        <PruningSection {...fieldProps} />
        {canManageTokens && <ApiTokensSection docSetId={docSetId} />}
      </Stack>
    </Box>
  );
}
