// Chooses the photo storage from the environment (validated with zod, like the rest of the server's settings).
import { join } from 'node:path';
import { z } from 'zod';
import { FsPhotoStorage } from './fs-storage';
import type { PhotoStorage } from './photo-storage';
import { S3PhotoStorage } from './s3-storage';

const blankToUndefined = (v: unknown) => (typeof v === 'string' && v.trim() === '' ? undefined : v);
const optionalText = z.preprocess(blankToUndefined, z.string().optional());

export const photoStorageEnvSchema = z
  .object({
    PHOTO_STORAGE: z.enum(['fs', 's3'], { message: 'PHOTO_STORAGE must be fs or s3' }).default('fs'),
    S3_ENDPOINT: z.preprocess(blankToUndefined, z.url({ message: 'S3_ENDPOINT must be a URL such as http://127.0.0.1:9000' }).optional()),
    S3_BUCKET: optionalText,
    S3_REGION: z.preprocess(blankToUndefined, z.string().default('us-east-1')),
    S3_ACCESS_KEY_ID: optionalText,
    S3_SECRET_ACCESS_KEY: optionalText,
    S3_FORCE_PATH_STYLE: z.preprocess(blankToUndefined, z.enum(['true', 'false', '1', '0']).default('false')),
  })
  .refine((e) => e.PHOTO_STORAGE !== 's3' || !!e.S3_BUCKET, { message: 'PHOTO_STORAGE=s3 needs S3_BUCKET', path: ['S3_BUCKET'] })
  .refine((e) => !e.S3_ACCESS_KEY_ID === !e.S3_SECRET_ACCESS_KEY, {
    message: 'set both S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY, or neither (to use the SDK default credentials)',
    path: ['S3_SECRET_ACCESS_KEY'],
  });

/** Photo storage for a server whose data folder is `dataDir`; throws with every bad setting listed. */
export function photoStorageFromEnv(env: NodeJS.ProcessEnv, dataDir: string): PhotoStorage {
  const parsed = photoStorageEnvSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`invalid photo storage configuration:\n${lines.join('\n')}`);
  }
  const e = parsed.data;
  if (e.PHOTO_STORAGE === 'fs') return new FsPhotoStorage(join(dataDir, 'photos'));
  return new S3PhotoStorage({
    endpoint: e.S3_ENDPOINT,
    bucket: e.S3_BUCKET!,
    region: e.S3_REGION,
    accessKeyId: e.S3_ACCESS_KEY_ID,
    secretAccessKey: e.S3_SECRET_ACCESS_KEY,
    forcePathStyle: e.S3_FORCE_PATH_STYLE === 'true' || e.S3_FORCE_PATH_STYLE === '1',
  });
}
