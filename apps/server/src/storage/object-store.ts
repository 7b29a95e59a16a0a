import {
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  PutObjectCommand,
  S3Client,
} from '@aws-sdk/client-s3';
import { getSignedUrl } from '@aws-sdk/s3-request-presigner';
import type { Config } from '../config.ts';

export interface ObjectStore {
  put(key: string, body: Uint8Array, contentType: string): Promise<void>;
  getBytes(key: string): Promise<Uint8Array>;
  delete(key: string): Promise<void>;
  /** A short-lived GET URL, so private objects never need a public bucket. */
  signedGetUrl(key: string, expiresInS?: number): Promise<string>;
  ping(): Promise<void>;
  close(): void;
}

/**
 * The SDK prints, once per process, that its releases after early 2027 will need Node.js 22.
 * Vatside runs on Node.js 20 on purpose (README, "Runtime"), so that one notice is silenced
 * before the first client is made; every other warning still prints.
 */
export function silenceSdkNodeVersionNotice(): void {
  process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= 'true';
}

export function createObjectStore(config: Config): ObjectStore {
  silenceSdkNodeVersionNotice();
  const client = new S3Client({
    endpoint: config.S3_ENDPOINT,
    region: config.S3_REGION,
    forcePathStyle: config.S3_FORCE_PATH_STYLE,
    credentials: {
      accessKeyId: config.S3_ACCESS_KEY_ID,
      secretAccessKey: config.S3_SECRET_ACCESS_KEY,
    },
    // The SDK's default streaming checksums are not understood by every S3-compatible store.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
  const Bucket = config.S3_BUCKET;

  return {
    async put(key, body, contentType) {
      await client.send(
        new PutObjectCommand({ Bucket, Key: key, Body: body, ContentType: contentType }),
      );
    },
    async getBytes(key) {
      const out = await client.send(new GetObjectCommand({ Bucket, Key: key }));
      if (!out.Body) throw new Error(`Object ${key} has no body`);
      return out.Body.transformToByteArray();
    },
    async delete(key) {
      await client.send(new DeleteObjectCommand({ Bucket, Key: key }));
    },
    signedGetUrl(key, expiresInS = 300) {
      return getSignedUrl(client, new GetObjectCommand({ Bucket, Key: key }), {
        expiresIn: expiresInS,
      });
    },
    async ping() {
      await client.send(new HeadBucketCommand({ Bucket }), {
        abortSignal: AbortSignal.timeout(3000),
      });
    },
    close() {
      client.destroy();
    },
  };
}
