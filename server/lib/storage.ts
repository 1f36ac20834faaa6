import { HeadBucketCommand, S3Client } from '@aws-sdk/client-s3';
import type { Config } from '../config';

/** The S3 client for photos: s3rver locally, any S3-compatible store by configuration. */
export function createStorage(s3: Config['s3']): S3Client {
  return new S3Client({
    endpoint: s3.endpoint,
    region: s3.region,
    forcePathStyle: s3.forcePathStyle,
    credentials: { accessKeyId: s3.accessKeyId, secretAccessKey: s3.secretAccessKey },
    // Without these, streamed uploads to S3-compatible stores keep the chunk framing.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
    maxAttempts: 2,
  });
}

export async function checkStorage(client: S3Client, bucket: string): Promise<void> {
  await client.send(new HeadBucketCommand({ Bucket: bucket }));
}
