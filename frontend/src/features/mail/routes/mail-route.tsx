import { Button, Tab, Tabs } from '@mui/material';
import SendOutlined from '@mui/icons-material/SendOutlined';
import { PageHeader } from '../../../components/ui/page-header.js';
import { useNotifier } from '../../../components/ui/notifier.js';
import { useUrlState } from '../../../components/ui/use-url-state.js';
import { errorMessage } from '../../../lib/api-client.js';
import { useDeliverOutbox } from '../api/deliver-outbox.js';
import { OUTBOX_STATUSES, type OutboxStatus } from '@linkloom/shared';
import { MailboxPanel } from '../components/mailbox-panel.js';
import { OutboxPanel } from '../components/outbox-panel.js';

const asStatus = (value: string): OutboxStatus | '' =>
  (OUTBOX_STATUSES as readonly string[]).includes(value) ? (value as OutboxStatus) : '';

export default function MailRoute() {
  const [state, setState] = useUrlState({ tab: 'mailbox', status: '', page: 1, pageSize: 25 });
  const deliver = useDeliverOutbox();
  const { notify } = useNotifier();
  const tab = state.tab === 'delivery' ? 'delivery' : 'mailbox';
  const paging = {
    page: state.page,
    pageSize: state.pageSize,
    onPageChange: (page: number) => setState({ page }),
    onPageSizeChange: (pageSize: number) => setState({ pageSize }),
  };
  const sendNow = () =>
    deliver.mutate(undefined, {
      onSuccess: ({ sent }) => notify(sent === 0 ? 'Nothing was due; no mail sent.' : `${sent} message${sent === 1 ? '' : 's'} sent.`),
      onError: (error) => notify(errorMessage(error), 'error'),
    });

  return (
    <>
      <PageHeader
        title="Mail"
        subtitle="Without SMTP_URL, Linkloom keeps its e-mail in this local mailbox instead of sending it out."
        actions={
          <Button variant="contained" startIcon={<SendOutlined />} disabled={deliver.isPending} onClick={sendNow}>
            {deliver.isPending ? 'Sending…' : 'Send due mail now'}
          </Button>
        }
      />
      <Tabs value={tab} onChange={(_, next: string) => setState({ tab: next, status: '' })} sx={{ mb: 2 }} aria-label="Mail views">
        <Tab value="mailbox" label="Local mailbox" />
        <Tab value="delivery" label="Delivery" />
      </Tabs>
      {tab === 'mailbox' ? (
        <MailboxPanel {...paging} />
      ) : (
        <OutboxPanel {...paging} status={asStatus(state.status)} onStatusChange={(status) => setState({ status })} />
      )}
    </>
  );
}
