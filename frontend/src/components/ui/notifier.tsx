import { createContext, useCallback, useContext, useMemo, useState, type ReactNode } from 'react';
import { Alert, Snackbar } from '@mui/material';

type Severity = 'success' | 'info' | 'warning' | 'error';
interface Note {
  id: number;
  message: string;
  severity: Severity;
}
interface Notifier {
  notify: (message: string, severity?: Severity) => void;
}

const NotifierContext = createContext<Notifier>({ notify: () => undefined });

/** One snackbar for the whole app; notes queue so none is lost. */
export function NotifierProvider({ children }: { children: ReactNode }) {
  const [queue, setQueue] = useState<Note[]>([]);
  const notify = useCallback((message: string, severity: Severity = 'success') => {
    setQueue((q) => [...q, { id: Date.now() + Math.random(), message, severity }]);
  }, []);
  const value = useMemo(() => ({ notify }), [notify]);
  const current = queue[0];
  const close = () => setQueue((q) => q.slice(1));
  return (
    <NotifierContext.Provider value={value}>
      {children}
      {current && (
        <Snackbar
          key={current.id}
          open
          autoHideDuration={current.severity === 'error' ? 8000 : 4000}
          onClose={(_, reason) => reason !== 'clickaway' && close()}
          anchorOrigin={{ vertical: 'bottom', horizontal: 'center' }}
        >
          <Alert severity={current.severity} variant="filled" onClose={close}>
            {current.message}
          </Alert>
        </Snackbar>
      )}
    </NotifierContext.Provider>
  );
}

/** `const { notify } = useNotifier(); notify('Saved')` or `notify(message, 'error')`. */
export function useNotifier(): Notifier {
  return useContext(NotifierContext);
}
