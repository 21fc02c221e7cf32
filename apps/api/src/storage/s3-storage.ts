import {
  GetObjectCommand,
  HeadObjectCommand,
  NoSuchKey,
  NotFound,
  PutObjectCommand,
  S3Client,
} from '@aws-sdk/client-s3';
import { keyFor, type BlobStorage } from './storage';

export interface S3StorageOptions {
  readonly endpoint?: string;
  readonly region: string;
  readonly bucket: string;
  readonly prefix?: string;
  readonly accessKeyId: string;
  readonly secretAccessKey: string;
  /** Path-style addressing, as most S3-compatible servers (and the test fake) need. */
  readonly forcePathStyle?: boolean;
}

/** An S3-compatible bucket through the AWS SDK, for deployments. */
export class S3Storage implements BlobStorage {
  readonly description: string;
  private readonly client: S3Client;
  private readonly bucket: string;
  private readonly prefix: string;

  constructor(options: S3StorageOptions) {
    this.client = new S3Client({
      region: options.region,
      ...(options.endpoint ? { endpoint: options.endpoint } : {}),
      forcePathStyle: options.forcePathStyle ?? true,
      credentials: { accessKeyId: options.accessKeyId, secretAccessKey: options.secretAccessKey },
    });
    this.bucket = options.bucket;
    this.prefix = options.prefix ? `${options.prefix.replace(/\/+$/, '')}/` : '';
    this.description = `S3 bucket ${options.bucket}${options.endpoint ? ` at ${options.endpoint}` : ''}`;
  }

  private key(sha256: string): string {
    return `${this.prefix}${keyFor(sha256)}`;
  }

  async put(sha256: string, bytes: Buffer, contentType: string): Promise<void> {
    if (await this.has(sha256)) return;
    await this.client.send(
      new PutObjectCommand({
        Bucket: this.bucket,
        Key: this.key(sha256),
        Body: bytes,
        ContentType: contentType,
      }),
    );
  }

  async get(sha256: string): Promise<Buffer | null> {
    try {
      const object = await this.client.send(
        new GetObjectCommand({ Bucket: this.bucket, Key: this.key(sha256) }),
      );
      if (!object.Body) return null;
      return Buffer.from(await object.Body.transformToByteArray());
    } catch (error) {
      if (error instanceof NoSuchKey || (error as { name?: string }).name === 'NoSuchKey')
        return null;
      throw error;
    }
  }

  async has(sha256: string): Promise<boolean> {
    try {
      await this.client.send(new HeadObjectCommand({ Bucket: this.bucket, Key: this.key(sha256) }));
      return true;
    } catch (error) {
      if (
        error instanceof NotFound ||
        (error as { name?: string }).name === 'NotFound' ||
        (error as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode === 404
      ) {
        return false;
      }
      throw error;
    }
  }

  destroy(): void {
    this.client.destroy();
  }
}
