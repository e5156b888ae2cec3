// Minimal types for s3rver 3.7 (the package ships none): what server/storage/localS3.ts uses.
declare module 's3rver' {
  import type { AddressInfo } from 'node:net'
  interface S3rverOptions {
    address?: string
    port?: number
    silent?: boolean
    directory: string
    resetOnClose?: boolean
    configureBuckets?: { name: string; configs?: unknown[] }[]
  }
  export default class S3rver {
    constructor(options: S3rverOptions)
    run(): Promise<AddressInfo>
    close(): Promise<void>
  }
}
