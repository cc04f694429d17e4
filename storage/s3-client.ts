// Builds the S3 client from plain settings, with no server-only guard, so tsx scripts (seed) can use it too.
import { S3Client } from "@aws-sdk/client-s3";

export type S3Config = {
  endpoint: string;
  region: string;
  accessKeyId: string;
  secretAccessKey: string;
};

export function makeS3Client(cfg: S3Config): S3Client {
  return new S3Client({
    endpoint: cfg.endpoint,
    region: cfg.region,
    credentials: { accessKeyId: cfg.accessKeyId, secretAccessKey: cfg.secretAccessKey },
    // Bucket in the path, not the host name: s3rver and most S3-compatible services need it.
    forcePathStyle: true,
    // Newer SDKs add flexible checksums by default, which stream uploads as aws-chunked; s3rver
    // then stores the chunk framing with the bytes (see /work/shared/STACK.md). Only when required.
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  });
}
