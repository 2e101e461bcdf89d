import { FormControlLabel, MenuItem, Stack, Switch, TextField } from '@mui/material';
import { TASK_KINDS, TASK_STATUSES, type Assignee } from '@linkloom/shared';
import { KIND_LABELS, STATUS_LABELS } from './task-labels.js';
import { useDocSets } from '../../doc-sets/api/get-doc-sets.js';

export interface TaskFilterState {
  docSetId: string;
  assignee: string;
  status: string[];
  kind: string;
  overdue: boolean;
}

interface Props {
  value: TaskFilterState;
  onChange: (patch: Partial<TaskFilterState>) => void;
  /** Empty when the reader may not choose another assignee. */
  assignees: Assignee[];
  showAssignee: boolean;
}

/** Filters of the task lists; the route keeps them in the address so a view can be shared. */
export function TaskFilters({ value, onChange, assignees, showAssignee }: Props) {
  const docSets = useDocSets();
  return (
    <Stack direction="row" spacing={1.5} sx={{ mb: 2, flexWrap: 'wrap', rowGap: 1.5 }}>
      <TextField
        select
        size="small"
        label="Doc set"
        value={value.docSetId}
        onChange={(e) => onChange({ docSetId: e.target.value })}
        sx={{ minWidth: 180 }}
      >
        <MenuItem value="">All doc sets</MenuItem>
        {(docSets.data ?? []).map((d) => (
          <MenuItem key={d.id} value={d.id}>
            {d.name}
          </MenuItem>
        ))}
      </TextField>
      {showAssignee && (
        <TextField
          select
          size="small"
          label="Assignee"
          value={value.assignee}
          onChange={(e) => onChange({ assignee: e.target.value })}
          sx={{ minWidth: 180 }}
        >
          <MenuItem value="">Anyone</MenuItem>
          {assignees.map((a) => (
            <MenuItem key={a.id} value={a.id}>
              {a.name}
            </MenuItem>
          ))}
        </TextField>
      )}
      <TextField
        select
        size="small"
        label="Status"
        value={value.status}
        sx={{ minWidth: 180 }}
        slotProps={{
          select: {
            multiple: true,
            renderValue: (v) =>
              (v as string[]).length ? (v as string[]).map((s) => STATUS_LABELS[s as keyof typeof STATUS_LABELS]).join(', ') : 'Any',
          },
        }}
        onChange={(e) => onChange({ status: e.target.value as unknown as string[] })}
      >
        {TASK_STATUSES.map((s) => (
          <MenuItem key={s} value={s}>
            {STATUS_LABELS[s]}
          </MenuItem>
        ))}
      </TextField>
      <TextField
        select
        size="small"
        label="Kind"
        value={value.kind}
        onChange={(e) => onChange({ kind: e.target.value })}
        sx={{ minWidth: 180 }}
      >
        <MenuItem value="">Any kind</MenuItem>
        {TASK_KINDS.map((k) => (
          <MenuItem key={k} value={k}>
            {KIND_LABELS[k]}
          </MenuItem>
        ))}
      </TextField>
      <FormControlLabel
        control={<Switch checked={value.overdue} onChange={(e) => onChange({ overdue: e.target.checked })} />}
        label="Overdue only"
      />
    </Stack>
  );
}
