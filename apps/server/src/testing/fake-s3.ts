import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import S3rver from 's3rver';
import type { S3Settings } from '../shop-log/photo-s3-storage';

/** s3rver's fixed credentials (its README). */
const S3RVER_KEY = 'S3RVER';

/** A local fake S3 server (s3rver) on a free loopback port with one empty bucket, in a temporary folder. */
export async function startFakeS3(bucket = 'barwright-photos'): Promise<{ settings: S3Settings; close(): Promise<void> }> {
  const directory = fs.mkdtempSync(path.join(os.tmpdir(), 'bw-s3-'));
  const server = new S3rver({ address: '127.0.0.1', port: 0, silent: true, directory, configureBuckets: [{ name: bucket }] });
  const { port } = await server.run();
  return {
    settings: { url: `http://127.0.0.1:${port}`, bucket, region: 'us-east-1', accessKeyId: S3RVER_KEY, secretAccessKey: S3RVER_KEY, pathStyle: true },
    close: async () => {
      await server.close();
      fs.rmSync(directory, { recursive: true, force: true });
    },
  };
}
