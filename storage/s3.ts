// Photo and file storage on S3 (s3rver locally): the shared client plus the few operations the app uses.
import "server-only";
import {
  CreateBucketCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  PutObjectCommand,
} from "@aws-sdk/client-s3";
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

/**
 * Content-Type is signed (the presigner leaves it out by default), so the uploader must send the
 * same header: a URL minted for an image cannot be used to store, say, text/html under that key.
 */
export function presignPut(key: string, contentType: string, expiresSec: number): Promise<string> {
  return getSignedUrl(s3, new PutObjectCommand({ Bucket, Key: key, ContentType: contentType }), {
    expiresIn: expiresSec,
    signableHeaders: new Set(["content-type"]),
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
