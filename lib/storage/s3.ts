import {
  DeleteObjectCommand, GetObjectCommand, ListObjectsV2Command, NoSuchKey, PutObjectCommand, S3Client, S3ServiceException,
} from "@aws-sdk/client-s3";
import { assertValidKey, type BlobStore, type StoredObject } from "./store";

export interface S3Settings {
  endpoint?: string;
  region: string;
  bucket: string;
  accessKeyId: string;
  secretAccessKey: string;
  /** Bucket in the path (http://host/bucket/key), as local and most self-hosted S3 servers want. */
  forcePathStyle: boolean;
}

/** STORAGE=s3 with S3_BUCKET, S3_REGION, S3_ENDPOINT (any S3-compatible server), S3_ACCESS_KEY_ID, S3_SECRET_ACCESS_KEY, S3_FORCE_PATH_STYLE. */
export function s3SettingsFromEnv(env: NodeJS.ProcessEnv = process.env): S3Settings {
  const need = (name: string) => {
    const value = env[name];
    if (!value) throw new Error(`STORAGE=s3 needs ${name}`);
    return value;
  };
  return {
    endpoint: env.S3_ENDPOINT || undefined,
    region: env.S3_REGION ?? "us-east-1",
    bucket: need("S3_BUCKET"),
    accessKeyId: need("S3_ACCESS_KEY_ID"),
    secretAccessKey: need("S3_SECRET_ACCESS_KEY"),
    forcePathStyle: env.S3_FORCE_PATH_STYLE === "1" || env.S3_FORCE_PATH_STYLE === "true",
  };
}

/** Objects in one bucket through the AWS SDK's S3 client; the bucket is private, the app serves every file. */
export class S3Store implements BlobStore {
  private readonly client: S3Client;
  readonly bucket: string;

  constructor(settings: S3Settings) {
    this.bucket = settings.bucket;
    this.client = new S3Client({
      endpoint: settings.endpoint,
      region: settings.region,
      forcePathStyle: settings.forcePathStyle,
      credentials: { accessKeyId: settings.accessKeyId, secretAccessKey: settings.secretAccessKey },
    });
  }

  async put(key: string, data: Uint8Array, meta?: { contentType?: string }): Promise<void> {
    assertValidKey(key);
    await this.client.send(new PutObjectCommand({ Bucket: this.bucket, Key: key, Body: data, ContentType: meta?.contentType }));
  }

  async get(key: string): Promise<Buffer | null> {
    assertValidKey(key);
    try {
      const out = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: key }));
      return out.Body ? Buffer.from(await out.Body.transformToByteArray()) : null;
    } catch (error) {
      if (error instanceof NoSuchKey || (error instanceof S3ServiceException && error.$metadata.httpStatusCode === 404)) return null;
      throw error;
    }
  }

  async delete(key: string): Promise<void> {
    assertValidKey(key);
    await this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key: key }));
  }

  async *list(): AsyncIterable<StoredObject> {
    let token: string | undefined;
    do {
      const page = await this.client.send(new ListObjectsV2Command({ Bucket: this.bucket, ContinuationToken: token }));
      for (const o of page.Contents ?? []) if (o.Key) yield { key: o.Key, modifiedAt: o.LastModified ?? new Date(0) };
      token = page.IsTruncated ? page.NextContinuationToken : undefined;
    } while (token);
  }
}
