import { useState } from 'react';
import type { ColumnDef } from '@tanstack/react-table';
import { Alert, AlertTitle, Box, Typography } from '@mui/material';
import { DataTable } from '../../../components/ui/data-table.js';
import { EmptyState } from '../../../components/ui/empty-state.js';
import { ApiError } from '../../../lib/api-client.js';
import type { MailboxMessageSummary } from '@linkloom/shared';
import { useMailbox } from '../api/get-mailbox.js';
import { MessageReader } from './message-reader.js';

interface MailboxPanelProps {
  page: number;
  pageSize: number;
  onPageChange: (page: number) => void;
  onPageSizeChange: (pageSize: number) => void;
}

const columns: ColumnDef<MailboxMessageSummary, unknown>[] = [
  { id: 'to', header: 'To', enableSorting: false, cell: ({ row }) => row.original.to.join(', ') },
  // Rendered as a React text node: a subject can never become markup.
  { id: 'subject', header: 'Subject', enableSorting: false, cell: ({ row }) => row.original.subject || '(no subject)' },
  { id: 'receivedAt', header: 'Received', enableSorting: false, cell: ({ row }) => new Date(row.original.receivedAt).toLocaleString() },
];

/** The messages the built-in mailbox caught, with a reading pane beside the list. */
export function MailboxPanel({ page, pageSize, onPageChange, onPageSizeChange }: MailboxPanelProps) {
  const mailbox = useMailbox(page, pageSize);
  const [openId, setOpenId] = useState<string | null>(null);

  if (mailbox.error instanceof ApiError && mailbox.error.code === 'MAILBOX_OFF') {
    return (
      <Alert severity="info" variant="outlined">
        <AlertTitle>The local mailbox is off</AlertTitle>
        Linkloom sends mail through the server named in SMTP_URL, so messages are read in that mail system. The Delivery tab still shows
        whether each one was sent.
      </Alert>
    );
  }

  return (
    <Box sx={{ display: 'grid', gap: 2, gridTemplateColumns: { xs: '1fr', lg: 'minmax(0, 1fr) minmax(0, 1fr)' }, alignItems: 'start' }}>
      <DataTable
        label="Caught messages"
        columns={columns}
        data={mailbox.data?.items}
        total={mailbox.data?.total ?? 0}
        page={page}
        pageSize={pageSize}
        sort=""
        onSortChange={() => undefined}
        onPageChange={onPageChange}
        onPageSizeChange={onPageSizeChange}
        loading={mailbox.isLoading}
        error={mailbox.error}
        onRetry={() => mailbox.refetch()}
        rowId={(m) => m.id}
        onRowClick={(m) => setOpenId(m.id)}
        toolbar={
          <Typography variant="body2" color="text.secondary">
            Click a message or press Enter on it to read it.
          </Typography>
        }
        emptyState={
          <EmptyState
            title="No mail caught yet"
            hint="Messages appear here once Linkloom sends one, e.g. a nightly digest or a task assignment. On the Delivery tab, “Send due mail now” sends what is waiting."
          />
        }
      />
      <MessageReader key={openId ?? 'none'} messageId={openId} />
    </Box>
  );
}
