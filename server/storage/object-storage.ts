import { HeadBucketCommand, S3Client } from '@aws-sdk/client-s3';
import type { Config } from '../config';

export interface ObjectStorage {
  client: S3Client;
  bucket: string;
}

/** The S3 client for photos. Checksums only when required: the local stand-in mangles streamed ones. */
export function createObjectStorage(config: Config): ObjectStorage {
  const client = new S3Client({
    region: config.S3_REGION,
    endpoint: config.S3_ENDPOINT,
    forcePathStyle: config.S3_FORCE_PATH_STYLE,
    credentials: {
      accessKeyId: config.S3_ACCESS_KEY_ID,
      secretAccessKey: config.S3_SECRET_ACCESS_KEY,
    },
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
  return { client, bucket: config.S3_BUCKET };
}

export async function bucketReachable(storage: ObjectStorage): Promise<boolean> {
  await storage.client.send(new HeadBucketCommand({ Bucket: storage.bucket }));
  return true;
}
