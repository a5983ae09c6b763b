import { createHash } from 'node:crypto';

import { GetObjectCommand, HeadObjectCommand, NoSuchKey, NotFound, PutObjectCommand, S3Client, S3ServiceException } from '@aws-sdk/client-s3';

/**
 * Where signed reports are kept. Objects are written once under a key of
 * their own and never replaced; on a real bucket, Object Lock in compliance
 * mode (retention set on the bucket) makes that hold against everyone.
 */
export interface ReportArchive {
  readonly bucket: string;
  /** Stores a new object; refuses (throws ArchiveConflict) if the key is taken. */
  putNew(key: string, body: Buffer, meta: { reportNumber: string }): Promise<void>;
  get(key: string): Promise<Buffer>;
  close(): void;
}

export class ArchiveConflict extends Error {
  constructor(key: string) {
    super(`The archive already holds ${key}; reports are never overwritten.`);
    this.name = 'ArchiveConflict';
  }
}

export interface S3ArchiveOptions {
  bucket: string;
  region: string;
  endpoint?: string | undefined;
  forcePathStyle: boolean;
  accessKeyId?: string | undefined;
  secretAccessKey?: string | undefined;
}

function isMissing(err: unknown): boolean {
  if (err instanceof NotFound || err instanceof NoSuchKey) return true;
  return err instanceof S3ServiceException && err.$metadata?.httpStatusCode === 404;
}

export function createS3Archive(options: S3ArchiveOptions): ReportArchive {
  // The SDK warns on Node 20 about releases that will need Node 22; this pinned one runs here.
  process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= 'true';
  const client = new S3Client({
    region: options.region,
    ...(options.endpoint ? { endpoint: options.endpoint } : {}),
    forcePathStyle: options.forcePathStyle,
    ...(options.accessKeyId && options.secretAccessKey
      ? { credentials: { accessKeyId: options.accessKeyId, secretAccessKey: options.secretAccessKey } }
      : {}),
    // Content-MD5 is sent explicitly below; the newer default checksum headers are not needed.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
    maxAttempts: 3,
  });
  const bucket = options.bucket;

  async function exists(key: string): Promise<boolean> {
    try {
      await client.send(new HeadObjectCommand({ Bucket: bucket, Key: key }));
      return true;
    } catch (err) {
      if (isMissing(err)) return false;
      throw err;
    }
  }

  return {
    bucket,
    async putNew(key, body, meta) {
      if (await exists(key)) throw new ArchiveConflict(key);
      await client.send(
        new PutObjectCommand({
          Bucket: bucket,
          Key: key,
          Body: body,
          ContentType: 'application/pdf',
          ContentLength: body.length,
          ContentMD5: createHash('md5').update(body).digest('base64'),
          // A real S3 bucket refuses the write if the key appeared meanwhile.
          IfNoneMatch: '*',
          Metadata: { 'report-number': meta.reportNumber, sha256: createHash('sha256').update(body).digest('hex') },
        }),
      );
    },
    async get(key) {
      const out = await client.send(new GetObjectCommand({ Bucket: bucket, Key: key }));
      if (!out.Body) throw new Error(`The archive returned no body for ${key}`);
      return Buffer.from(await out.Body.transformToByteArray());
    },
    close() {
      client.destroy();
    },
  };
}
