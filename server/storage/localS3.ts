// The local S3-compatible fake (s3rver) for development and tests: in-process on 127.0.0.1, any free
// port, files under the git-ignored .data folder, the bucket created when missing.
import fs from 'node:fs'
import S3rver from 's3rver'
import { createS3Storage, type ObjectStorage } from './objectStorage'

export const LOCAL_S3_CREDENTIALS = { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' } as const

export interface LocalS3 {
  endpoint: string
  storage: ObjectStorage
  close(): Promise<void>
}

export async function startLocalS3(options: { directory: string; bucket: string; port?: number }): Promise<LocalS3> {
  fs.mkdirSync(options.directory, { recursive: true })
  const server = new S3rver({ address: '127.0.0.1', port: options.port ?? 0, silent: true, directory: options.directory })
  const address = await server.run()
  const endpoint = `http://127.0.0.1:${address.port}`
  const storage = createS3Storage({ endpoint, bucket: options.bucket, region: 'us-east-1', forcePathStyle: true, ...LOCAL_S3_CREDENTIALS })
  await storage.ensureBucket()
  return {
    endpoint,
    storage,
    async close() {
      storage.close()
      await server.close()
    },
  }
}
