import { useState } from 'react';
import { Alert, Button, IconButton, List, ListItem, ListItemText, Stack, TextField, Tooltip, Typography } from '@mui/material';
import DeleteOutline from '@mui/icons-material/DeleteOutlined';
import { ConfirmDialog } from '../../../../components/ui/confirm-dialog.js';
import { useNotifier } from '../../../../components/ui/notifier.js';
import { errorMessage } from '../../../../lib/api-client.js';
import type { ApiToken } from '@linkloom/shared';
import { useTokens } from '../../api/get-tokens.js';
import { useCreateToken } from '../../api/create-token.js';
import { useDeleteToken } from '../../api/delete-token.js';
import { Section } from './settings-fields.js';

/** Tokens let a CI job upload archives for this doc set; the secret is shown once, at creation. */
export function ApiTokensSection({ docSetId }: { docSetId: string }) {
  const tokens = useTokens(docSetId);
  const create = useCreateToken(docSetId);
  const remove = useDeleteToken(docSetId);
  const { notify } = useNotifier();
  const [name, setName] = useState('');
  const [secret, setSecret] = useState<string | null>(null);
  const [revoking, setRevoking] = useState<ApiToken | null>(null);

  const submit = () => {
    if (!name.trim()) return notify('Name the token after where it is used, e.g. “CI pipeline”.', 'warning');
    create.mutate(name.trim(), {
      onSuccess: ({ token }) => {
        setSecret(token);
        setName('');
      },
      onError: (error) => notify(errorMessage(error), 'error'),
    });
  };

  return (
    <Section title="API tokens" intro="For scripts and CI jobs that upload archives or read reports for this doc set.">
      {secret && (
        <Alert severity="warning" onClose={() => setSecret(null)}>
          Copy this token now; it will not be shown again.
          <Typography component="code" sx={{ display: 'block', mt: 1, wordBreak: 'break-all', fontFamily: 'monospace' }}>
            {secret}
          </Typography>
        </Alert>
      )}
      <Stack direction="row" spacing={1}>
        <TextField size="small" label="Token name" value={name} onChange={(e) => setName(e.target.value)} />
        <Button variant="outlined" onClick={submit} disabled={create.isPending}>
          Create token
        </Button>
      </Stack>
      {tokens.isError && <Alert severity="error">{errorMessage(tokens.error)}</Alert>}
      {tokens.data?.length === 0 && (
        <Typography variant="body2" color="text.secondary">
          No tokens yet.
        </Typography>
      )}
      <List dense>
        {tokens.data?.map((t) => (
          <ListItem
            key={t.id}
            disableGutters
            secondaryAction={
              <Tooltip title="Revoke">
                <IconButton aria-label={`Revoke ${t.name}`} onClick={() => setRevoking(t)}>
                  <DeleteOutline />
                </IconButton>
              </Tooltip>
            }
          >
            <ListItemText
              primary={t.name}
              secondary={`created ${new Date(t.createdAt).toLocaleDateString()}${t.lastUsedAt ? `, last used ${new Date(t.lastUsedAt).toLocaleString()}` : ', never used'}`}
            />
          </ListItem>
        ))}
      </List>
      <ConfirmDialog
        open={revoking !== null}
        title="Revoke token?"
        destructive
        confirmLabel="Revoke"
        busy={remove.isPending}
        body={`Scripts using “${revoking?.name}” will stop working at once.`}
        onClose={() => setRevoking(null)}
        onConfirm={() =>
          revoking &&
          remove.mutate(revoking.id, {
            onSuccess: () => {
              notify('Token revoked');
              setRevoking(null);
            },
            onError: (error) => notify(errorMessage(error), 'error'),
          })
        }
      />
    </Section>
  );
}
