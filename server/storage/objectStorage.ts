// Object storage for uploaded files through the S3 API (@aws-sdk/client-s3): a real bucket from the
// environment (config.s3), or the local fake started by main.ts and the tests (localS3.ts).
import { CreateBucketCommand, DeleteObjectCommand, GetObjectCommand, HeadBucketCommand, PutObjectCommand, S3Client } from '@aws-sdk/client-s3'

export interface S3Settings {
  endpoint: string | undefined
  bucket: string
  region: string
  accessKeyId: string
  secretAccessKey: string
  /** Path-style addressing: needed by the local fake and most S3-compatible services. */
  forcePathStyle: boolean
}

export interface ObjectStorage {
  put(key: string, body: Buffer, contentType: string): Promise<void>
  get(key: string): Promise<Buffer>
  delete(key: string): Promise<void>
  close(): void
}

export function createS3Storage(settings: S3Settings): ObjectStorage & { ensureBucket(): Promise<void> } {
  const client = new S3Client({
    endpoint: settings.endpoint,
    region: settings.region,
    forcePathStyle: settings.forcePathStyle,
    credentials: { accessKeyId: settings.accessKeyId, secretAccessKey: settings.secretAccessKey },
  })
  const Bucket = settings.bucket
  return {
    async ensureBucket() {
      try {
        await client.send(new HeadBucketCommand({ Bucket }))
      } catch {
        await client.send(new CreateBucketCommand({ Bucket }))
      }
    },
    async put(key, body, contentType) {
      await client.send(new PutObjectCommand({ Bucket, Key: key, Body: body, ContentType: contentType, ContentLength: body.length }))
    },
    async get(key) {
      const out = await client.send(new GetObjectCommand({ Bucket, Key: key }))
      if (!out.Body) throw new Error(`object ${key} has no body`)
      return Buffer.from(await out.Body.transformToByteArray())
    },
    async delete(key) {
      await client.send(new DeleteObjectCommand({ Bucket, Key: key }))
    },
    close: () => client.destroy(),
  }
}
