// s3rver as the local S3, with the app's bucket.
import path from 'node:path';
import { CreateBucketCommand, HeadBucketCommand, S3Client } from '@aws-sdk/client-s3';
import { HOST, PORTS, REPO_ROOT, S3_BUCKET, S3_REGION } from './profile';
import { serviceIdentity, type ServiceDefinition, type UpContext } from './service';

process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= 'true';

/** An S3 client set up for s3rver; without the checksum settings streamed uploads get corrupted. */
export function localS3Client(port: number): S3Client {
  return new S3Client({
    endpoint: `http://${HOST}:${port}`,
    region: S3_REGION,
    forcePathStyle: true,
    credentials: { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' },
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
}

export function s3Service(ctx: UpContext): ServiceDefinition {
  const port = PORTS[ctx.profile].s3;
  return {
    ...serviceIdentity(ctx.profile, 's3'),
    command: () => ({
      command: process.execPath,
      args: [
        path.join(REPO_ROOT, 'node_modules/s3rver/bin/s3rver.js'),
        '--directory',
        ctx.paths.s3,
        '--address',
        HOST,
        '--port',
        String(port),
        '--silent',
      ],
    }),
    async configure() {
      const client = localS3Client(port);
      try {
        await client.send(new HeadBucketCommand({ Bucket: S3_BUCKET }));
      } catch {
        await client.send(new CreateBucketCommand({ Bucket: S3_BUCKET }));
      } finally {
        client.destroy();
      }
    },
  };
}
