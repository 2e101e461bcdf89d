import { useCallback, useState } from 'react';

/**
 * Selected rows across pages of a server-paged table. The table reports ids only; the rows themselves are
 * remembered as they are selected, since earlier pages are no longer in the query cache's current answer.
 */
export function useRowSelection<T>(rowId: (row: T) => string) {
  const [selected, setSelected] = useState<Map<string, T>>(new Map());
  const onSelectionChange = useCallback(
    (ids: string[], visible: T[]) => {
      setSelected((previous) => {
        const next = new Map<string, T>();
        const onScreen = new Map(visible.map((r) => [rowId(r), r]));
        for (const id of ids) {
          const row = previous.get(id) ?? onScreen.get(id);
          if (row) next.set(id, row);
        }
        return next;
      });
    },
    [rowId],
  );
  const clear = useCallback(() => setSelected(new Map()), []);
  return { ids: [...selected.keys()], rows: [...selected.values()], onSelectionChange, clear };
}
