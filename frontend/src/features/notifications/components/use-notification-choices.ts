import type { MailKind, NotificationSettings, UpdateNotificationSettings } from '@linkloom/shared';
import { useNotificationSettings } from '../api/get-notification-settings.js';
import { useUpdateNotificationSettings } from '../api/update-notification-settings.js';
import type { DocSetChoice } from './doc-set-choices-table.js';

/** The settings as they will be once `patch` is saved (turning a digest off also clears "nothing changed"). */
export function applyPatch(settings: NotificationSettings, patch: UpdateNotificationSettings): NotificationSettings {
  const changes = new Map((patch.docSets ?? []).map((d) => [d.docSetId, d]));
  return {
    ...settings,
    timeZone: patch.timeZone ?? settings.timeZone,
    timeZoneIsDefault: patch.timeZone ? false : settings.timeZoneIsDefault,
    kinds: { ...settings.kinds, ...patch.kinds },
    docSets: settings.docSets.map((d) => {
      const next = { ...d, ...changes.get(d.docSetId) };
      return next.digest ? next : { ...next, nothingChanged: false };
    }),
  };
}

/** The person's mail choices with one-call setters; while a save runs, the screen shows what was asked for. */
export function useNotificationChoices() {
  const settings = useNotificationSettings();
  const update = useUpdateNotificationSettings();
  const shown = settings.data && update.isPending && update.variables ? applyPatch(settings.data, update.variables) : settings.data;
  return {
    settings,
    shown,
    saving: update.isPending,
    /** Whether anything was sent yet, so "saved" is said only after a change. */
    changed: !update.isIdle,
    saveError: update.error,
    setKind: (kind: MailKind, on: boolean) => update.mutate({ kinds: { [kind]: on } }),
    setDocSet: (docSetId: string, change: DocSetChoice) => update.mutate({ docSets: [{ docSetId, ...change }] }),
    setTimeZone: (timeZone: string) => update.mutate({ timeZone }),
  };
}
