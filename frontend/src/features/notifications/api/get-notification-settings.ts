import { queryOptions, useQuery } from '@tanstack/react-query';
import { notificationSettingsSchema, type NotificationSettings } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';

export const notificationSettingsQueryKey = () => ['me', 'notifications'] as const;

export function getNotificationSettings(signal?: AbortSignal): Promise<NotificationSettings> {
  return apiFetch('/me/notifications', notificationSettingsSchema, { signal });
}

export function notificationSettingsQueryOptions() {
  return queryOptions({ queryKey: notificationSettingsQueryKey(), queryFn: ({ signal }) => getNotificationSettings(signal) });
}

export function useNotificationSettings() {
  return useQuery(notificationSettingsQueryOptions());
}
