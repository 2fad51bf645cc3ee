import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import S3rver from 's3rver';

export interface RunningObjectStore {
  endpoint: string;
  bucket: string;
  accessKeyId: string;
  secretAccessKey: string;
  stop(): Promise<void>;
}

/** Stand-in for S3-compatible object storage: s3rver on 127.0.0.1 with one bucket for photos. */
export async function startObjectStore(dir: string, port: number): Promise<RunningObjectStore> {
  const directory = join(dir, 's3');
  mkdirSync(directory, { recursive: true });
  const bucket = 'fieldcurve-photos';
  const server = new S3rver({
    address: '127.0.0.1',
    port,
    silent: true,
    directory,
    configureBuckets: [{ name: bucket, configs: [] }],
  });
  await server.run();
  return {
    endpoint: `http://127.0.0.1:${port}`,
    bucket,
    // s3rver accepts exactly this fixed pair.
    accessKeyId: 'S3RVER',
    secretAccessKey: 'S3RVER',
    stop: () => server.close(),
  };
}
