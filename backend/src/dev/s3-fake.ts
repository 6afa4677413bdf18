import type { AddressInfo } from 'node:net';

import S3rver from 's3rver';

export interface S3Fake {
  endpoint: string;
  close(): Promise<void>;
}

/** The local S3 fake on loopback, storing objects in its own folder. */
export async function startS3Fake(options: { directory: string; port?: number }): Promise<S3Fake> {
  process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED = 'true';
  const server = new S3rver({
    port: options.port ?? 0,
    address: '127.0.0.1',
    silent: true,
    directory: options.directory,
  });
  const address = (await server.run()) as AddressInfo;
  return {
    endpoint: `http://127.0.0.1:${address.port}`,
    close: () => server.close(),
  };
}
