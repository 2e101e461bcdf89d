import { useState } from 'react';
import { Box, Paper, Stack, ToggleButton, ToggleButtonGroup, Typography } from '@mui/material';
import { EmptyState } from '../../../components/ui/empty-state.js';
import { ErrorPanel } from '../../../components/ui/error-panel.js';
import { LoadingSkeleton } from '../../../components/ui/loading-skeleton.js';
import { useMailboxMessage } from '../api/get-mailbox-message.js';

type View = 'text' | 'html';

/**
 * Reading pane for one caught message. The HTML body is whatever the sender wrote, so it is shown only in an
 * iframe with an empty `sandbox` attribute: no scripts, no forms, no navigation of the app, and a unique
 * origin so it cannot read the session (WHATWG HTML Living Standard, "The iframe element", sandbox attribute; from memory).
 */
export function MessageReader({ messageId }: { messageId: string | null }) {
  const message = useMailboxMessage(messageId);
  const [view, setView] = useState<View>('text');

  if (!messageId) return <EmptyState title="No message open" hint="Pick a message in the list to read it here." />;
  if (message.isLoading) return <LoadingSkeleton count={6} />;
  if (message.error) return <ErrorPanel error={message.error} onRetry={() => message.refetch()} title="This message could not be opened" />;
  const data = message.data;
  if (!data) return null;

  return (
    <Paper variant="outlined" component="article" aria-label="Message" sx={{ p: 2 }}>
      <Stack spacing={1}>
        <Typography variant="h3" component="h2" sx={{ wordBreak: 'break-word' }}>
          {data.subject || '(no subject)'}
        </Typography>
        <Typography variant="body2" color="text.secondary">
          From {data.from || 'unknown'} · to {data.to.join(', ') || 'nobody'} · {new Date(data.receivedAt).toLocaleString()}
        </Typography>
        <ToggleButtonGroup
          size="small"
          exclusive
          value={view}
          onChange={(_, next: View | null) => next && setView(next)}
          aria-label="Show message as"
        >
          <ToggleButton value="text">Plain text</ToggleButton>
          <ToggleButton value="html" disabled={!data.html}>
            HTML
          </ToggleButton>
        </ToggleButtonGroup>
        {view === 'html' && data.html ? (
          <Box
            component="iframe"
            title={`HTML of “${data.subject}”`}
            sandbox=""
            srcDoc={data.html}
            sx={{ width: '100%', height: 480, border: 1, borderColor: 'divider', borderRadius: 1, bgcolor: '#fff' }}
          />
        ) : (
          <Box component="pre" sx={{ whiteSpace: 'pre-wrap', wordBreak: 'break-word', m: 0, fontFamily: 'monospace', fontSize: 13 }}>
            {data.text || '(this message has no plain-text part; switch to HTML)'}
          </Box>
        )}
      </Stack>
    </Paper>
  );
}
