import { mkdirSync } from 'node:fs';
import type { AddressInfo } from 'node:net';

import S3rver from 's3rver';

// The local stand-in for object storage: s3rver on 127.0.0.1, its objects in
// a folder under the data folder. Production points the S3 settings at a
// real bucket instead and sets S3_FAKE=false.

export interface S3Fake {
  endpoint: string;
  port: number;
  close(): Promise<void>;
}

export async function startS3Fake(options: { port: number; directory: string; bucket: string }): Promise<S3Fake> {
  mkdirSync(options.directory, { recursive: true });
  const server = new S3rver({
    address: '127.0.0.1',
    port: options.port,
    directory: options.directory,
    silent: true,
    configureBuckets: [{ name: options.bucket }],
  });
  const address = (await server.run()) as AddressInfo;
  return {
    endpoint: `http://127.0.0.1:${address.port}`,
    port: address.port,
    close: async () => {
      const http = (server as unknown as { httpServer?: { closeAllConnections?: () => void } }).httpServer;
      http?.closeAllConnections?.();
      await server.close();
    },
  };
}
