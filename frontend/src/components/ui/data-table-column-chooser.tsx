import { useState } from 'react';
import type { Table } from '@tanstack/react-table';
import { Checkbox, IconButton, ListItemText, Menu, MenuItem, Tooltip } from '@mui/material';
import ViewColumnOutlined from '@mui/icons-material/ViewColumnOutlined';

export function columnLabel<T>(table: Table<T>, columnId: string): string {
  const column = table.getColumn(columnId);
  const def = column?.columnDef;
  if (def?.meta?.label) return def.meta.label;
  return typeof def?.header === 'string' ? def.header : columnId;
}

/** A menu of check boxes, one per hideable column. */
export function ColumnChooser<T>({ table }: { table: Table<T> }) {
  const [anchor, setAnchor] = useState<HTMLElement | null>(null);
  const columns = table.getAllLeafColumns().filter((c) => c.getCanHide());
  return (
    <>
      <Tooltip title="Choose columns">
        <IconButton aria-label="Choose columns" size="small" onClick={(e) => setAnchor(e.currentTarget)}>
          <ViewColumnOutlined fontSize="small" />
        </IconButton>
      </Tooltip>
      <Menu anchorEl={anchor} open={anchor !== null} onClose={() => setAnchor(null)}>
        {columns.map((column) => (
          <MenuItem key={column.id} dense onClick={() => column.toggleVisibility()}>
            <Checkbox
              size="small"
              checked={column.getIsVisible()}
              tabIndex={-1}
              disableRipple
              slotProps={{ input: { 'aria-label': columnLabel(table, column.id) } }}
            />
            <ListItemText primary={columnLabel(table, column.id)} />
          </MenuItem>
        ))}
      </Menu>
    </>
  );
}
