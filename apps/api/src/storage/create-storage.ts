import type { StorageConfig } from '../config/config';
import { LocalDiskStorage } from './local-disk-storage';
import { S3Storage } from './s3-storage';
import type { BlobStorage } from './storage';

/** The storage driver the configuration names. */
export function createStorage(config: StorageConfig): BlobStorage {
  if (config.driver === 's3') {
    return new S3Storage({
      ...(config.endpoint ? { endpoint: config.endpoint } : {}),
      region: config.region,
      bucket: config.bucket,
      prefix: config.prefix,
      accessKeyId: config.accessKeyId,
      secretAccessKey: config.secretAccessKey,
    });
  }
  return new LocalDiskStorage(config.folder);
}
