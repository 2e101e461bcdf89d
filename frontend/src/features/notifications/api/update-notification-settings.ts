import { useMutation, useQueryClient } from '@tanstack/react-query';
import { notificationSettingsSchema, type NotificationSettings, type UpdateNotificationSettings } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { notificationSettingsQueryKey } from './get-notification-settings.js';

/** Sends only what changed; the server answers with the whole stored state. */
export function updateNotificationSettings(patch: UpdateNotificationSettings): Promise<NotificationSettings> {
  return apiFetch('/me/notifications', notificationSettingsSchema, { method: 'PATCH', body: patch });
}

export function useUpdateNotificationSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateNotificationSettings,
    // Quick successive switches must reach the server in the order they were made.
    scope: { id: 'me-notifications' },
    onSuccess: (saved) => queryClient.setQueryData(notificationSettingsQueryKey(), saved),
  });
}
