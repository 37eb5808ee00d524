import { API_BASE, apiFetch } from '@/hooks/api/client';
import { tokenStore } from '@/hooks/api/token-store';
import type { PhotoRequest } from '@/sync/photos';

/*
 * The photo uploader's way to the server: the same origin and bearer token as hooks/api/client.ts, but with the
 * raw Response (photo routes answer bytes, HEAD answers nothing, PUT sends bytes). On a 401 it lets apiFetch
 * refresh the access token (it does so once, shared by all callers) and tries again.
 */
export const photoRequest: PhotoRequest = async (path, init) => {
  const send = () => {
    const t = tokenStore.get();
    return fetch(`${API_BASE}${path}`, {
      method: init.method,
      headers: { ...init.headers, ...(t ? { authorization: `Bearer ${t.accessToken}` } : {}) },
      body: init.body as BodyInit | undefined,
    });
  };
  const res = await send();
  if (res.status !== 401 || !tokenStore.get()) return res;
  try {
    await apiFetch('/api/me');
  } catch {
    return res;
  }
  return send();
};
