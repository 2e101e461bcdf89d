import { Tab, Tabs } from '@mui/material';
import type { TaskKind } from '@linkloom/shared';
import { DataTable } from '../../../components/ui/data-table.js';
import { EmptyState } from '../../../components/ui/empty-state.js';
import { PageHeader } from '../../../components/ui/page-header.js';
import { useUrlState } from '../../../components/ui/use-url-state.js';
import { useRoleAtLeast } from '../../../lib/use-role.js';
import { useAssignees } from '../api/get-assignees.js';
import { useTasks } from '../api/get-tasks.js';
import { taskColumns } from '../components/task-columns.js';
import { TaskDetailDrawer } from '../components/task-detail-drawer.js';
import { TaskFilters } from '../components/task-filters.js';

const DEFAULTS = {
  view: 'mine',
  docSetId: '',
  assignee: '',
  status: ['open', 'in-progress'] as string[],
  kind: '',
  overdue: false,
  page: 1,
  pageSize: 50,
  sort: '',
  task: '',
};

/**
 * Writers: "My tasks" only. Editors and admins: "My tasks" and "All tasks". Viewers, who are never assigned
 * work, read all tasks without any action. The open task shows in a side panel (`?task=`).
 */
export default function TasksRoute() {
  const [state, setState] = useUrlState(DEFAULTS);
  const isEditor = useRoleAtLeast('editor');
  const canBeAssigned = useRoleAtLeast('writer');
  const isWriterOnly = canBeAssigned && !isEditor;
  const mine = canBeAssigned && (state.view === 'mine' || isWriterOnly);
  const assignees = useAssignees(isEditor);
  const tasks = useTasks({
    assignee: mine ? 'me' : state.assignee || undefined,
    status: state.status,
    kind: (state.kind || undefined) as TaskKind | undefined,
    docSetId: state.docSetId || undefined,
    overdue: state.overdue,
    page: state.page,
    pageSize: state.pageSize,
    sort: state.sort || undefined,
  });
  return (
    <>
      <PageHeader
        title={mine ? 'My tasks' : canBeAssigned ? 'All tasks' : 'Tasks'}
        subtitle="Fix work made from findings. A task is fixed and verified when a later run no longer finds any of its findings."
      />
      {isEditor && (
        <Tabs value={mine ? 'mine' : 'all'} onChange={(_, view) => setState({ view })} sx={{ mb: 2 }} aria-label="Task lists">
          <Tab value="mine" label="My tasks" />
          <Tab value="all" label="All tasks" />
        </Tabs>
      )}
      <TaskFilters value={state} onChange={setState} assignees={assignees.data?.items ?? []} showAssignee={!mine && isEditor} />
      <DataTable
        label={mine ? 'My tasks' : 'All tasks'}
        columns={taskColumns}
        data={tasks.data?.items}
        total={tasks.data?.total ?? 0}
        page={state.page}
        pageSize={state.pageSize}
        sort={state.sort}
        onPageChange={(page) => setState({ page })}
        onPageSizeChange={(pageSize) => setState({ pageSize })}
        onSortChange={(sort) => setState({ sort })}
        loading={tasks.isFetching}
        error={tasks.error}
        onRetry={() => tasks.refetch()}
        rowId={(t) => t.id}
        onRowClick={(t) => setState({ task: t.id, page: state.page })}
        emptyState={
          <EmptyState
            title="No tasks here"
            hint={
              mine
                ? 'Nothing is assigned to you with these filters.'
                : isEditor
                  ? 'Create tasks from a page or from the findings lists.'
                  : 'No tasks match these filters.'
            }
          />
        }
      />
      <TaskDetailDrawer taskId={state.task || null} onClose={() => setState({ task: '', page: state.page })} />
    </>
  );
}
