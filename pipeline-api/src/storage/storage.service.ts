import { Injectable, Logger, OnModuleDestroy } from '@nestjs/common';
import {
  AbortMultipartUploadCommand,
  CompleteMultipartUploadCommand,
  CreateMultipartUploadCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  HeadObjectCommand,
  ListObjectsV2Command,
  S3Client,
  UploadPartCommand,
} from '@aws-sdk/client-s3';
import { getSignedUrl } from '@aws-sdk/s3-request-presigner';
import type { Readable } from 'node:stream';
import { Env } from '../config/env.validation';

/** One uploaded part as the client reports it after its PUT. */
export interface UploadedPart {
  partNumber: number;
  etag: string;
}

/** Owns the single S3 client of the process and the bucket it writes to. */
@Injectable()
export class StorageService implements OnModuleDestroy {
  readonly client: S3Client;
  readonly bucket: string;
  private readonly urlSeconds: number;
  private readonly logger = new Logger('Storage');

  constructor(env: Env) {
    this.bucket = env.S3_BUCKET;
    this.urlSeconds = env.PRESIGNED_URL_SECONDS;
    this.client = new S3Client({
      endpoint: env.S3_ENDPOINT,
      region: env.S3_REGION,
      forcePathStyle: env.S3_FORCE_PATH_STYLE,
      credentials: { accessKeyId: env.S3_ACCESS_KEY_ID, secretAccessKey: env.S3_SECRET_ACCESS_KEY },
    });
  }

  /** Resolves when the bucket answers; rejects after `timeoutMs`. */
  async ping(timeoutMs: number): Promise<void> {
    await this.client.send(new HeadBucketCommand({ Bucket: this.bucket }), {
      abortSignal: AbortSignal.timeout(timeoutMs),
    });
  }

  /** Starts a multipart upload to `key`; returns its upload id. */
  async createMultipart(key: string, contentType: string): Promise<string> {
    const out = await this.client.send(
      new CreateMultipartUploadCommand({ Bucket: this.bucket, Key: key, ContentType: contentType }),
    );
    if (!out.UploadId) throw new Error(`the S3 store gave no upload id for ${key}`);
    return out.UploadId;
  }

  /** A presigned PUT URL for one part of a multipart upload. */
  presignPart(key: string, uploadId: string, partNumber: number): Promise<string> {
    const command = new UploadPartCommand({
      Bucket: this.bucket,
      Key: key,
      UploadId: uploadId,
      PartNumber: partNumber,
    });
    // The presigner is pinned to a slightly older SDK release; its client type differs only nominally.
    return getSignedUrl(this.client as never, command as never, { expiresIn: this.urlSeconds });
  }

  /** When presigned URLs made now stop working. */
  urlExpiry(): Date {
    return new Date(Date.now() + this.urlSeconds * 1000);
  }

  /** Joins the uploaded parts into one object. */
  async completeMultipart(key: string, uploadId: string, parts: UploadedPart[]): Promise<void> {
    await this.client.send(
      new CompleteMultipartUploadCommand({
        Bucket: this.bucket,
        Key: key,
        UploadId: uploadId,
        MultipartUpload: {
          Parts: [...parts]
            .sort((a, b) => a.partNumber - b.partNumber)
            .map((p) => ({ PartNumber: p.partNumber, ETag: p.etag })),
        },
      }),
    );
  }

  /**
   * Drops a multipart upload and its parts (again is harmless). A store without the operation
   * (the local fake) keeps the parts, which never become an object; in production a bucket
   * lifecycle rule for incomplete multipart uploads removes such leftovers.
   */
  async abortMultipart(key: string, uploadId: string): Promise<void> {
    try {
      await this.client.send(
        new AbortMultipartUploadCommand({ Bucket: this.bucket, Key: key, UploadId: uploadId }),
      );
    } catch (e) {
      const name = (e as { name?: string }).name ?? '';
      if (name === 'NoSuchUpload') return;
      if (name === 'MethodNotAllowed' || name === 'NotImplemented') {
        this.logger.warn(`the S3 store cannot abort multipart uploads; parts of ${key} stay`);
        return;
      }
      throw e;
    }
  }

  /** The stored size of an object in bytes, or null when there is no such object. */
  async size(key: string): Promise<number | null> {
    try {
      const head = await this.client.send(new HeadObjectCommand({ Bucket: this.bucket, Key: key }));
      return head.ContentLength ?? 0;
    } catch (e) {
      const err = e as { name?: string; $metadata?: { httpStatusCode?: number } };
      if (err.name === 'NotFound' || err.$metadata?.httpStatusCode === 404) return null;
      throw e;
    }
  }

  /** The object's bytes as a stream. */
  async stream(key: string): Promise<Readable> {
    const out = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: key }));
    return out.Body as Readable;
  }

  /** Deletes an object (an absent one is fine). */
  async delete(key: string): Promise<void> {
    await this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key: key }));
  }

  /** Keys under a prefix (at most 1,000: enough for one asset's files). */
  async list(prefix: string): Promise<string[]> {
    const out = await this.client.send(
      new ListObjectsV2Command({ Bucket: this.bucket, Prefix: prefix }),
    );
    return (out.Contents ?? []).map((o) => o.Key as string);
  }

  /** A presigned GET URL that downloads the object under `fileName`. */
  presignDownload(key: string, fileName: string): Promise<string> {
    const safe = fileName.replace(/["\\\r\n]/g, '_');
    const command = new GetObjectCommand({
      Bucket: this.bucket,
      Key: key,
      ResponseContentDisposition: `attachment; filename="${safe}"`,
    });
    return getSignedUrl(this.client as never, command as never, { expiresIn: this.urlSeconds });
  }

  onModuleDestroy(): void {
    this.client.destroy();
  }
}
