import { Platform } from 'react-native';
import { PhotoQueue, browserTriggerEnv, createMemoryPhotoStore, httpPhotoApi, idbPhotoDatabaseName, openIdbPhotoStore, type PhotoStore } from '@/sync/photos';
import { photoRequest } from './photo-request';

/*
 * One photo store per signed-in person on this device and one upload queue per club, kept for the life of the
 * page (uploads continue while the person moves between screens). On the web the store is IndexedDB; native
 * builds keep photos in memory until an expo-sqlite photo store exists (see README "Photos").
 */

const stores = new Map<string, Promise<PhotoStore>>();
const queues = new Map<string, Promise<PhotoQueue>>();

function storeFor(userId: string): Promise<PhotoStore> {
  let s = stores.get(userId);
  if (!s) {
    s = Platform.OS === 'web' && typeof indexedDB !== 'undefined' ? openIdbPhotoStore(idbPhotoDatabaseName(userId)) : Promise.resolve(createMemoryPhotoStore());
    stores.set(userId, s);
    s.catch(() => stores.delete(userId));
  }
  return s;
}

export function photoQueueFor(userId: string, clubId: string): Promise<PhotoQueue> {
  const key = `${userId}/${clubId}`;
  let q = queues.get(key);
  if (!q) {
    q = storeFor(userId).then((store) => {
      const queue = new PhotoQueue({ store, api: httpPhotoApi(photoRequest, clubId), clubId, triggers: browserTriggerEnv() });
      queue.start();
      return queue;
    });
    queues.set(key, q);
    q.catch(() => queues.delete(key));
  }
  return q;
}
