import { useState, type FormEvent } from 'react';
import { Box, Breadcrumbs, Button, Link, MenuItem, TextField, Typography } from '@mui/material';
import { folderCrumbs } from './map-model.js';

export const NODE_LIMITS = [100, 300, 1000];

interface MapToolbarProps {
  folder: string;
  folderDepth: number;
  limit: number;
  onChange: (patch: { folder?: string; folderDepth?: number; limit?: number }) => void;
  /** Returns false when no node matches, so the box can say so. */
  onFind: (words: string) => boolean;
}

export function MapToolbar({ folder, folderDepth, limit, onChange, onFind }: MapToolbarProps) {
  const [words, setWords] = useState('');
  const [missed, setMissed] = useState(false);
  const crumbs = folderCrumbs(folder);
  const find = (event: FormEvent) => {
    event.preventDefault();
    setMissed(!onFind(words));
  };
  return (
    <Box sx={{ display: 'flex', gap: 2, flexWrap: 'wrap', alignItems: 'flex-start', mb: 2 }}>
      <Box component="form" role="search" onSubmit={find} sx={{ display: 'flex', gap: 1 }}>
        <TextField
          size="small"
          label="Find a page or folder"
          value={words}
          error={missed}
          helperText={missed ? 'Not on this map: try a folder above, or the Pages list.' : undefined}
          onChange={(e) => {
            setWords(e.target.value);
            setMissed(false);
          }}
        />
        <Button type="submit" variant="outlined">
          Find
        </Button>
      </Box>
      <TextField
        select
        size="small"
        label="Folder depth"
        value={folderDepth}
        sx={{ width: 130 }}
        onChange={(e) => onChange({ folderDepth: Number(e.target.value) })}
      >
        {[1, 2, 3, 4].map((d) => (
          <MenuItem key={d} value={d}>
            {d}
          </MenuItem>
        ))}
      </TextField>
      <TextField
        select
        size="small"
        label="Most nodes"
        value={limit}
        sx={{ width: 130 }}
        onChange={(e) => onChange({ limit: Number(e.target.value) })}
      >
        {NODE_LIMITS.map((l) => (
          <MenuItem key={l} value={l}>
            {l}
          </MenuItem>
        ))}
      </TextField>
      <Breadcrumbs aria-label="Folder" sx={{ alignSelf: 'center' }}>
        {crumbs.map((c, i) =>
          i === crumbs.length - 1 ? (
            <Typography key={c.folder} color="text.primary">
              {c.label}
            </Typography>
          ) : (
            <Link key={c.folder} component="button" type="button" onClick={() => onChange({ folder: c.folder })}>
              {c.label}
            </Link>
          ),
        )}
      </Breadcrumbs>
    </Box>
  );
}
