import { ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import type { Config } from '../config.ts';
import { silenceSdkNodeVersionNotice } from '../storage/object-store.ts';

/** Counts the objects under a prefix with ListObjectsV2, straight from the store (tests only). */
export async function countObjects(config: Config, prefix: string): Promise<number> {
  silenceSdkNodeVersionNotice();
  const client = new S3Client({
    endpoint: config.S3_ENDPOINT,
    region: config.S3_REGION,
    forcePathStyle: config.S3_FORCE_PATH_STYLE,
    credentials: {
      accessKeyId: config.S3_ACCESS_KEY_ID,
      secretAccessKey: config.S3_SECRET_ACCESS_KEY,
    },
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
  try {
    let total = 0;
    let token: string | undefined;
    do {
      const page = await client.send(
        new ListObjectsV2Command({
          Bucket: config.S3_BUCKET,
          Prefix: prefix,
          ContinuationToken: token,
        }),
      );
      total += page.KeyCount ?? 0;
      token = page.NextContinuationToken;
    } while (token);
    return total;
  } finally {
    client.destroy();
  }
}
