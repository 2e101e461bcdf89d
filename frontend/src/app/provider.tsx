import type { ReactNode } from 'react';
import { CssBaseline } from '@mui/material';
import { ThemeProvider } from '@mui/material/styles';
import { QueryClientProvider } from '@tanstack/react-query';
import { queryClient } from '../lib/query-client.js';
import { theme } from '../lib/theme.js';
import { NotifierProvider } from '../components/ui/notifier.js';

export function AppProvider({ children }: { children: ReactNode }) {
  return (
    <ThemeProvider theme={theme}>
      <CssBaseline />
      <QueryClientProvider client={queryClient}>
        <NotifierProvider>{children}</NotifierProvider>
      </QueryClientProvider>
    </ThemeProvider>
  );
}
