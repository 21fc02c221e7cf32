/**
 * Where uploaded files live, addressed by the SHA-256 of their content. The
 * same bytes are stored once, whatever they are called and however often they
 * are attached.
 */
export interface BlobStorage {
  /** Stores the bytes under their hash; storing the same hash twice is a no-op. */
  put(sha256: string, bytes: Buffer, contentType: string): Promise<void>;
  /** The bytes, or null when nothing is stored under that hash. */
  get(sha256: string): Promise<Buffer | null>;
  has(sha256: string): Promise<boolean>;
  /** A short description for logs and health ("local disk at …", "S3 bucket …"). */
  readonly description: string;
  /**
   * Maintenance (upload-sweeper.ts), where the driver has it: removes
   * half-written files, lists blobs, deletes one blob unless it was stored
   * again after `unchangedSince`. A bucket writes objects whole, so S3 needs
   * no partial sweep.
   */
  sweepPartials?(olderThanMs: number): Promise<number>;
  listBlobs?(): Promise<StoredBlob[]>;
  delete?(sha256: string, unchangedSince: Date): Promise<boolean>;
}

export interface StoredBlob {
  readonly sha256: string;
  readonly modifiedAt: Date;
}

const HASH = /^[0-9a-f]{64}$/;

/** Refuses anything but a lower-case hex SHA-256, so a key can never name a path. */
export function assertHash(sha256: string): void {
  if (!HASH.test(sha256)) throw new Error(`not a SHA-256 hex digest: ${JSON.stringify(sha256)}`);
}

/** ab/cd/abcd…: two levels of fan-out keep folders small. */
export function keyFor(sha256: string): string {
  assertHash(sha256);
  return `${sha256.slice(0, 2)}/${sha256.slice(2, 4)}/${sha256}`;
}
