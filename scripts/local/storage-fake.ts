// Local stand-in for S3: s3rver keeps objects on disk under the services folder.
import S3rver from 's3rver';

export interface StorageFake {
  close(): Promise<void>;
}

export async function startStorageFake({ port, directory, bucket }: { port: number; directory: string; bucket: string }): Promise<StorageFake> {
  const server = new S3rver({ port, address: '127.0.0.1', silent: true, directory, configureBuckets: [{ name: bucket, configs: [] }] });
  await server.run();
  return { close: () => server.close() };
}
