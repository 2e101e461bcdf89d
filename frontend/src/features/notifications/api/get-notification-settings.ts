import { queryOptions, useQuery } from '@tanstack/react-query';
import type { NotificationSettings } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';

export const notificationSettingsQueryKey = () => ['me', 'notifications'] as const;

export function getNotificationSettings(signal?: AbortSignal): Promise<NotificationSettings> {
  return apiFetch<NotificationSettings>('/me/notifications', { signal });
}

export function notificationSettingsQueryOptions() {
  return queryOptions({ queryKey: notificationSettingsQueryKey(), queryFn: ({ signal }) => getNotificationSettings(signal) });
}

export function useNotificationSettings() {
  return useQuery(notificationSettingsQueryOptions());
}
