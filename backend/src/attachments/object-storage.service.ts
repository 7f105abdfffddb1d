import {
  CreateBucketCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3';
import { Inject, Injectable, Logger, OnApplicationBootstrap, OnModuleDestroy } from '@nestjs/common';
import { APP_CONFIG, AppConfig } from '../config/config';

/**
 * Attachment bytes in an S3-compatible bucket through the official SDK, configured only from
 * `config.s3`: the local fake in development and tests, a real bucket by setting the endpoint,
 * region, bucket and credentials (none set: the SDK's default credential chain). Outside
 * production the bucket is created when missing.
 */
@Injectable()
export class ObjectStorageService implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger('ObjectStorage');
  private readonly client: S3Client;
  private readonly bucket: string;
  private bucketReady: Promise<void> | undefined;

  constructor(@Inject(APP_CONFIG) private readonly config: AppConfig) {
    const { endpoint, region, bucket, accessKeyId, secretAccessKey, forcePathStyle } = config.s3;
    this.bucket = bucket;
    this.client = new S3Client({
      region,
      endpoint,
      forcePathStyle,
      credentials: accessKeyId && secretAccessKey ? { accessKeyId, secretAccessKey } : undefined,
    });
  }

  onApplicationBootstrap(): void {
    // In development, make the bucket at start; a missing store is reported, not fatal (it may start later).
    if (this.config.nodeEnv === 'development') {
      this.ensureBucket().catch((error: unknown) => {
        this.logger.warn(`bucket ${this.bucket} is not reachable yet: ${error instanceof Error ? error.message : String(error)}`);
      });
    }
  }

  onModuleDestroy(): void {
    this.client.destroy();
  }

  /** Create the bucket unless it exists (never in production, where it is provisioned). */
  ensureBucket(): Promise<void> {
    if (this.config.nodeEnv === 'production') return Promise.resolve();
    this.bucketReady ??= this.createBucketIfMissing().catch((error: unknown) => {
      this.bucketReady = undefined;
      throw error;
    });
    return this.bucketReady;
  }

  async put(key: string, bytes: Uint8Array, contentType: string): Promise<void> {
    await this.ensureBucket();
    await this.client.send(
      new PutObjectCommand({ Bucket: this.bucket, Key: key, Body: bytes, ContentType: contentType, ContentLength: bytes.length }),
    );
  }

  /** The object's bytes, or undefined when the key is not in the bucket. */
  async get(key: string): Promise<Uint8Array | undefined> {
    try {
      const result = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: key }));
      return result.Body ? await result.Body.transformToByteArray() : new Uint8Array(0);
    } catch (error) {
      if (error instanceof S3ServiceException && (error.name === 'NoSuchKey' || error.$metadata.httpStatusCode === 404)) return undefined;
      throw error;
    }
  }

  async delete(key: string): Promise<void> {
    await this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key: key }));
  }

  private async createBucketIfMissing(): Promise<void> {
    try {
      await this.client.send(new HeadBucketCommand({ Bucket: this.bucket }));
    } catch (error) {
      if (!(error instanceof S3ServiceException) || error.$metadata.httpStatusCode !== 404) throw error;
      await this.client.send(new CreateBucketCommand({ Bucket: this.bucket }));
    }
  }
}
