import { randomUUID } from 'node:crypto';
import type { Readable } from 'node:stream';
import { DeleteObjectCommand, GetObjectCommand, HeadBucketCommand, PutObjectCommand, S3Client, S3ServiceException } from '@aws-sdk/client-s3';
import { mimeOfStoredName, namesFor, requireStoredName, type PhotoStorage, type StoredPhoto } from './photo-storage';

/** How to reach the bucket (S3_URL, S3_BUCKET, S3_REGION, S3_ACCESS_KEY_ID, S3_SECRET_ACCESS_KEY, S3_PATH_STYLE). */
export interface S3Settings {
  /** The endpoint: `https://s3.eu-west-1.amazonaws.com`, a MinIO or other S3-compatible server's URL. */
  url: string;
  bucket: string;
  region: string;
  /** Both or neither; without them the SDK's own chain (AWS_* variables, instance role) applies. */
  accessKeyId?: string;
  secretAccessKey?: string;
  /** `host/bucket/key` rather than `bucket.host/key`: what most S3-compatible servers expect. */
  pathStyle: boolean;
}

/**
 * Photo files as objects `photos/<name>` in an S3-compatible bucket, shared by every instance.
 * A PutObject is visible whole or not at all, so no half file is ever served.
 */
export class S3PhotoStorage implements PhotoStorage {
  private readonly client: S3Client;

  constructor(private readonly settings: S3Settings) {
    this.client = new S3Client({
      endpoint: settings.url,
      region: settings.region,
      forcePathStyle: settings.pathStyle,
      credentials: settings.accessKeyId && settings.secretAccessKey ? { accessKeyId: settings.accessKeyId, secretAccessKey: settings.secretAccessKey } : undefined,
      // Checksums only where the API requires them: several S3-compatible servers refuse the SDK's
      // newer default trailers (common practice for non-AWS endpoints).
      requestChecksumCalculation: 'WHEN_REQUIRED',
      responseChecksumValidation: 'WHEN_REQUIRED',
      maxAttempts: 3,
      requestHandler: { connectionTimeout: 5_000, requestTimeout: 30_000 },
    });
  }

  get description() {
    return `S3 bucket ${this.settings.bucket} at ${this.settings.url}`;
  }

  /** Fails the start early, naming the settings, when the bucket cannot be reached. */
  async verify(): Promise<void> {
    try {
      await this.client.send(new HeadBucketCommand({ Bucket: this.settings.bucket }));
    } catch (error) {
      const why = error instanceof S3ServiceException ? `${error.name} (HTTP ${error.$metadata.httpStatusCode})` : (error as Error).message;
      throw new Error(`Invalid configuration:\n  S3_URL, S3_BUCKET: bucket "${this.settings.bucket}" at ${this.settings.url} cannot be reached: ${why}`);
    }
  }

  async save(extension: string, full: Buffer, thumb: Buffer): Promise<{ fileName: string; thumbName: string }> {
    const names = namesFor(randomUUID(), extension);
    await this.put(names.fileName, full);
    try {
      await this.put(names.thumbName, thumb);
    } catch (error) {
      await this.remove(names.fileName).catch(() => {});
      throw error;
    }
    return names;
  }

  private async put(name: string, data: Buffer) {
    await this.client.send(new PutObjectCommand({ Bucket: this.settings.bucket, Key: this.keyOf(name), Body: data, ContentType: mimeOfStoredName(name), ContentLength: data.length }));
  }

  async read(name: string): Promise<StoredPhoto | undefined> {
    try {
      const object = await this.client.send(new GetObjectCommand({ Bucket: this.settings.bucket, Key: this.keyOf(name) }));
      return { body: object.Body as Readable, bytes: object.ContentLength ?? 0 };
    } catch (error) {
      if (error instanceof S3ServiceException && (error.name === 'NoSuchKey' || error.$metadata.httpStatusCode === 404)) return undefined;
      throw error;
    }
  }

  async remove(...names: string[]): Promise<void> {
    // One DeleteObject each: DeleteObjects needs a Content-MD5 that not every compatible server checks alike.
    await Promise.all(names.map((n) => this.client.send(new DeleteObjectCommand({ Bucket: this.settings.bucket, Key: this.keyOf(n) }))));
  }

  /** The object key of a stored name (checked: names come from the database). */
  keyOf(name: string): string {
    return `photos/${requireStoredName(name)}`;
  }

  close(): void {
    this.client.destroy();
  }
}
