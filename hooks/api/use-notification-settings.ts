import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { notificationSettingsResponseSchema, type NotificationSettings, type NotificationSettingsResponse } from '@/shared/schemas';
import { apiFetch } from './client';

const key = (clubId: string) => ['clubs', clubId, 'notification-settings'] as const;

/** The signed-in person's review e-mail settings in a club, and the kinds their role there receives. */
export function useNotificationSettings(clubId: string | undefined) {
  return useQuery({
    queryKey: key(clubId ?? ''),
    queryFn: async () => notificationSettingsResponseSchema.parse(await apiFetch(`/api/clubs/${clubId}/notification-settings`)),
    enabled: !!clubId,
  });
}

/** Saves the whole set; the switch moves at once and moves back if the server refuses. */
export function useSaveNotificationSettings(clubId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (settings: NotificationSettings) =>
      notificationSettingsResponseSchema.parse(await apiFetch(`/api/clubs/${clubId}/notification-settings`, { method: 'PUT', json: settings })),
    onMutate: async (settings) => {
      await qc.cancelQueries({ queryKey: key(clubId) });
      const previous = qc.getQueryData<NotificationSettingsResponse>(key(clubId));
      if (previous) qc.setQueryData<NotificationSettingsResponse>(key(clubId), { ...previous, settings });
      return { previous };
    },
    onError: (_err, _settings, context) => {
      if (context?.previous) qc.setQueryData(key(clubId), context.previous);
    },
    onSuccess: (answer) => qc.setQueryData(key(clubId), answer),
  });
}
