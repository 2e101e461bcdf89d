import type { ReactNode } from 'react';
import { Box, Typography } from '@mui/material';
import InboxOutlined from '@mui/icons-material/InboxOutlined';

interface EmptyStateProps {
  title: string;
  /** What to do next, in a sentence. */
  hint?: ReactNode;
  action?: ReactNode;
  icon?: ReactNode;
}

export function EmptyState({ title, hint, action, icon }: EmptyStateProps) {
  return (
    <Box role="status" sx={{ textAlign: 'center', py: 6, px: 2, color: 'text.secondary' }}>
      <Box sx={{ fontSize: 40, color: 'primary.light', mb: 1 }}>{icon ?? <InboxOutlined fontSize="inherit" />}</Box>
      <Typography variant="h3" component="p" color="text.primary" gutterBottom>
        {title}
      </Typography>
      {hint && (
        <Typography variant="body2" sx={{ maxWidth: 480, mx: 'auto' }}>
          {hint}
        </Typography>
      )}
      {action && <Box sx={{ mt: 2 }}>{action}</Box>}
    </Box>
  );
}
