// Photo and file storage on S3 (s3rver locally): the shared client plus the few operations the app uses.
import "server-only";
import {
  CreateBucketCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  HeadObjectCommand,
  PutObjectCommand,
} from "@aws-sdk/client-s3";
import { createPresignedPost } from "@aws-sdk/s3-presigned-post";
import { getSignedUrl } from "@aws-sdk/s3-request-presigner";
import { env } from "@/lib/env";
import { makeS3Client } from "./s3-client";

export const s3 = makeS3Client({
  endpoint: env.S3_ENDPOINT,
  region: env.S3_REGION,
  accessKeyId: env.S3_ACCESS_KEY_ID,
  secretAccessKey: env.S3_SECRET_ACCESS_KEY,
});

const Bucket = env.S3_BUCKET;

export async function putObject(key: string, body: Buffer, contentType: string): Promise<void> {
  await s3.send(new PutObjectCommand({ Bucket, Key: key, Body: body, ContentType: contentType, ContentLength: body.length }));
}

export async function getObjectBytes(key: string): Promise<Buffer> {
  const res = await s3.send(new GetObjectCommand({ Bucket, Key: key }));
  if (!res.Body) throw new Error(`S3 object ${key} has no body`);
  return Buffer.from(await res.Body.transformToByteArray());
}

export async function deleteObject(key: string): Promise<void> {
  await s3.send(new DeleteObjectCommand({ Bucket, Key: key }));
}

/** The object's size in bytes from its headers (HeadObject), without reading the body. */
export async function objectSize(key: string): Promise<number> {
  const res = await s3.send(new HeadObjectCommand({ Bucket, Key: key }));
  return res.ContentLength ?? 0;
}

/** Thrown by `getObjectBytesUpTo` when the body turns out longer than the caller's limit. */
export class ObjectTooLarge extends Error {
  constructor(
    readonly key: string,
    readonly bytesSeen: number,
  ) {
    super(`S3 object ${key} is larger than allowed (${bytesSeen} bytes read so far)`);
    this.name = "ObjectTooLarge";
  }
}

/**
 * Reads an object chunk by chunk and stops (closing the connection) as soon as it passes
 * `maxBytes`, so an oversize object never sits whole in memory whatever its headers said.
 */
export async function getObjectBytesUpTo(key: string, maxBytes: number): Promise<Buffer> {
  const res = await s3.send(new GetObjectCommand({ Bucket, Key: key }));
  if (!res.Body) throw new Error(`S3 object ${key} has no body`);
  const body = res.Body as AsyncIterable<Uint8Array> & { destroy?: () => void };
  const chunks: Buffer[] = [];
  let total = 0;
  for await (const chunk of body) {
    total += chunk.length;
    if (total > maxBytes) {
      body.destroy?.();
      throw new ObjectTooLarge(key, total);
    }
    chunks.push(Buffer.from(chunk));
  }
  return Buffer.concat(chunks, total);
}

export type PresignedPost = { url: string; fields: Record<string, string> };

/**
 * A browser form upload (S3 POST Object with a signed policy) of one file to `key`. Unlike a
 * presigned PUT, the policy binds the size: S3 refuses a file outside `content-length-range`
 * before storing it, and a Content-Type other than the one signed (AWS S3 API reference,
 * "Creating a POST policy", condition matching). The caller still checks the stored size,
 * because stores that ignore the policy (s3rver 3.7.1 among them) would accept anything.
 */
export function presignPost(key: string, contentType: string, maxBytes: number, expiresSec: number): Promise<PresignedPost> {
  return createPresignedPost(s3, {
    Bucket,
    Key: key,
    Fields: { "Content-Type": contentType },
    Conditions: [["content-length-range", 1, maxBytes]],
    Expires: expiresSec,
  });
}

export function presignGet(key: string, expiresSec: number): Promise<string> {
  return getSignedUrl(s3, new GetObjectCommand({ Bucket, Key: key }), { expiresIn: expiresSec });
}

export async function ensureBucket(): Promise<void> {
  try {
    await s3.send(new HeadBucketCommand({ Bucket }));
  } catch (err) {
    if (!isMissing(err)) throw err;
    try {
      await s3.send(new CreateBucketCommand({ Bucket }));
    } catch (createErr) {
      // Another process may have created it between the two calls.
      if ((createErr as { name?: string }).name !== "BucketAlreadyOwnedByYou") throw createErr;
    }
  }
}

/** True when S3 said the object (or bucket) does not exist. */
export function isMissing(err: unknown): boolean {
  const e = err as { name?: string; $metadata?: { httpStatusCode?: number } } | null;
  return e?.name === "NoSuchKey" || e?.name === "NotFound" || e?.name === "NoSuchBucket" || e?.$metadata?.httpStatusCode === 404;
}
