import { useRef, useState, type DragEvent } from 'react';
import { Box, Typography } from '@mui/material';
import UploadFileOutlined from '@mui/icons-material/UploadFileOutlined';

/** A drop target that is also a keyboard-reachable button opening the file picker. */
export function ArchiveDropZone({ onFile }: { onFile: (file: File) => void }) {
  const input = useRef<HTMLInputElement>(null);
  const [over, setOver] = useState(false);
  const drop = (event: DragEvent) => {
    event.preventDefault();
    setOver(false);
    const file = event.dataTransfer.files[0];
    if (file) onFile(file);
  };
  return (
    <Box
      role="button"
      tabIndex={0}
      aria-label="Choose a .zip archive, or drop one here"
      onClick={() => input.current?.click()}
      onKeyDown={(e) => (e.key === 'Enter' || e.key === ' ') && (e.preventDefault(), input.current?.click())}
      onDragOver={(e) => {
        e.preventDefault();
        setOver(true);
      }}
      onDragLeave={() => setOver(false)}
      onDrop={drop}
      sx={{
        border: 2,
        borderStyle: 'dashed',
        borderColor: over ? 'secondary.main' : 'divider',
        borderRadius: 2,
        p: 4,
        textAlign: 'center',
        cursor: 'pointer',
        bgcolor: over ? 'action.hover' : 'transparent',
        '&:focus-visible': { outline: '3px solid', outlineColor: 'secondary.main' },
      }}
    >
      <UploadFileOutlined sx={{ fontSize: 40, color: 'primary.light' }} />
      <Typography>Drop a .zip of your Markdown here, or press to choose one.</Typography>
      <Typography variant="caption" color="text.secondary">
        Folders, images and front matter are kept; nothing leaves this server.
      </Typography>
      <input
        ref={input}
        type="file"
        accept=".zip,application/zip"
        hidden
        data-testid="archive-input"
        onChange={(e) => {
          const f = e.target.files?.[0];
          if (f) onFile(f);
          e.target.value = '';
        }}
      />
    </Box>
  );
}
