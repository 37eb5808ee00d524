import { useClubCreate, useClubDelete, useClubItem, useClubList, useClubUpdate } from './use-club-records';

export const useEvents = (clubId: string | undefined) => useClubList('events', clubId);
export const useEvent = (clubId: string | undefined, eventId: string | undefined) => useClubItem('events', clubId, eventId);
export const useCreateEvent = (clubId: string) => useClubCreate('events', clubId);
export const useUpdateEvent = (clubId: string, eventId: string) => useClubUpdate('events', clubId, eventId);
export const useDeleteEvent = (clubId: string) => useClubDelete('events', clubId);
