import { Paper, Stack, Switch, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import { EmptyState } from '../../../components/ui/empty-state.js';
import { ErrorPanel } from '../../../components/ui/error-panel.js';
import { LoadingSkeleton } from '../../../components/ui/loading-skeleton.js';
import { useDocSets } from '../../doc-sets/api/get-doc-sets.js';
import type { Subscription } from '@linkloom/shared';
import { useSubscriptions } from '../api/get-subscriptions.js';
import { useUpdateSubscriptions } from '../api/update-subscriptions.js';

/** Turning the digest off also clears "when nothing changed", which only means something with a digest. */
export function applyChoice(all: Subscription[], docSetId: string, change: Partial<Omit<Subscription, 'docSetId'>>): Subscription[] {
  return all.map((s) => {
    if (s.docSetId !== docSetId) return s;
    const next = { ...s, ...change };
    return next.digest ? next : { ...next, nothingChanged: false };
  });
}

function SaveState({ pending, error }: { pending: boolean; error: unknown }) {
  if (pending)
    return (
      <Typography variant="body2" color="text.secondary" role="status">
        Saving…
      </Typography>
    );
  if (error) return <ErrorPanel error={error} title="Your choice was not saved" />;
  return (
    <Typography variant="body2" color="text.secondary" role="status">
      All choices saved.
    </Typography>
  );
}

/** The account page's mail choices: per doc set, the nightly digest and whether to get it when nothing changed. */
export function SubscriptionsSection() {
  const subscriptions = useSubscriptions();
  const docSets = useDocSets();
  const update = useUpdateSubscriptions();
  // While a save is under way the switches show what was asked for, not the older stored state.
  const shown = (update.isPending ? update.variables : undefined) ?? subscriptions.data?.subscriptions ?? [];
  const nameOf = new Map((docSets.data ?? []).map((d) => [d.id, d.name]));
  const choose = (docSetId: string, change: Partial<Omit<Subscription, 'docSetId'>>) => update.mutate(applyChoice(shown, docSetId, change));

  let body;
  if (subscriptions.isLoading) body = <LoadingSkeleton count={3} />;
  else if (subscriptions.error)
    body = <ErrorPanel error={subscriptions.error} onRetry={() => subscriptions.refetch()} title="Your mail choices could not be loaded" />;
  else if (shown.length === 0)
    body = <EmptyState title="No doc sets yet" hint="Once a doc set exists you can choose here to get its nightly digest." />;
  else
    body = (
      <>
        <Table size="small" aria-label="Nightly digests">
          <TableHead>
            <TableRow>
              <TableCell>Doc set</TableCell>
              <TableCell>Nightly digest</TableCell>
              <TableCell>Also when nothing changed</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {shown.map((s) => {
              const name = nameOf.get(s.docSetId) ?? s.docSetId;
              return (
                <TableRow key={s.docSetId}>
                  <TableCell>{name}</TableCell>
                  <TableCell>
                    <Switch
                      checked={s.digest}
                      onChange={(e) => choose(s.docSetId, { digest: e.target.checked })}
                      slotProps={{ input: { 'aria-label': `Nightly digest for ${name}` } }}
                    />
                  </TableCell>
                  <TableCell>
                    <Switch
                      checked={s.digest && s.nothingChanged}
                      disabled={!s.digest}
                      onChange={(e) => choose(s.docSetId, { nothingChanged: e.target.checked })}
                      slotProps={{ input: { 'aria-label': `Also when nothing changed for ${name}` } }}
                    />
                  </TableCell>
                </TableRow>
              );
            })}
          </TableBody>
        </Table>
        <SaveState pending={update.isPending} error={update.error} />
      </>
    );

  return (
    <Paper variant="outlined" component="section" aria-labelledby="subscriptions-title" sx={{ p: 3, mt: 3 }}>
      <Stack spacing={2}>
        <div>
          <Typography variant="h3" component="h2" id="subscriptions-title">
            E-mail digests
          </Typography>
          <Typography variant="body2" color="text.secondary">
            After each nightly run Linkloom can mail you what changed in a doc set. Each switch is saved at once.
          </Typography>
        </div>
        {body}
      </Stack>
    </Paper>
  );
}
