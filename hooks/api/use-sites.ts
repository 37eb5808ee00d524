import { useClubCreate, useClubDelete, useClubItem, useClubList, useClubUpdate } from './use-club-records';

export const useSites = (clubId: string | undefined) => useClubList('sites', clubId);
export const useSite = (clubId: string | undefined, siteId: string | undefined) => useClubItem('sites', clubId, siteId);
export const useCreateSite = (clubId: string) => useClubCreate('sites', clubId);
export const useUpdateSite = (clubId: string, siteId: string) => useClubUpdate('sites', clubId, siteId);
export const useDeleteSite = (clubId: string) => useClubDelete('sites', clubId);
