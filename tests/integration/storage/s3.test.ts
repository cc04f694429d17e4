// Photo storage against the local S3 fake: bytes survive a round trip unchanged (buffered and
// streamed), presigned URLs work from plain fetch, and a missing key is an error.
import { createHash, randomBytes, randomUUID } from "node:crypto";
import { Readable } from "node:stream";
import { GetObjectCommand, PutObjectCommand } from "@aws-sdk/client-s3";
import { beforeAll, describe, expect, it } from "vitest";
import { env } from "@/lib/env";
import { deleteObject, ensureBucket, getObjectBytes, isMissing, presignGet, presignPut, putObject, s3 } from "@/storage/s3";

const prefix = `tests/${randomUUID()}`;
const sha256 = (b: Uint8Array) => createHash("sha256").update(b).digest("hex");

beforeAll(async () => {
  await ensureBucket();
});

describe("storage/s3", () => {
  it("round-trips ~300 KB of random bytes through putObject/getObjectBytes unchanged", async () => {
    const bytes = randomBytes(300 * 1024 + 7); // odd length: no chunk size divides it evenly
    const key = `${prefix}/buffered.bin`;
    await putObject(key, bytes, "application/octet-stream");
    const back = await getObjectBytes(key);
    expect(back.length).toBe(bytes.length);
    expect(sha256(back)).toBe(sha256(bytes));
    expect(Buffer.compare(back, bytes)).toBe(0);
  });

  it("round-trips a streamed upload byte for byte (no aws-chunked framing stored)", async () => {
    // The trap this guards against: without WHEN_REQUIRED checksums the SDK streams the body as
    // aws-chunked and s3rver stores the framing too (/work/shared/STACK.md, "S3 fake").
    const bytes = randomBytes(300 * 1024);
    const chunks = Array.from({ length: 10 }, (_, i) => bytes.subarray(i * 30 * 1024, (i + 1) * 30 * 1024));
    const key = `${prefix}/streamed.bin`;
    await s3.send(
      new PutObjectCommand({
        Bucket: env.S3_BUCKET,
        Key: key,
        Body: Readable.from(chunks),
        ContentLength: bytes.length,
        ContentType: "image/jpeg",
      }),
    );
    const res = await s3.send(new GetObjectCommand({ Bucket: env.S3_BUCKET, Key: key }));
    expect(res.ContentType).toBe("image/jpeg");
    expect(res.ContentLength).toBe(bytes.length);
    const back = Buffer.from(await res.Body!.transformToByteArray());
    expect(Buffer.compare(back, bytes)).toBe(0);
  });

  it("accepts a presigned PUT from fetch and serves it back through a presigned GET", async () => {
    const bytes = randomBytes(64 * 1024);
    const key = `${prefix}/presigned photo.png`; // a space, to exercise key encoding in the URL
    const putUrl = await presignPut(key, "image/png", 60);
    // Query-string auth per AWS SigV4 presigning: the URL carries the signature, not a header.
    expect(new URL(putUrl).searchParams.get("X-Amz-Algorithm")).toBe("AWS4-HMAC-SHA256");
    expect(new URL(putUrl).searchParams.get("X-Amz-Expires")).toBe("60");
    const put = await fetch(putUrl, { method: "PUT", body: bytes, headers: { "content-type": "image/png" } });
    expect(put.status).toBe(200);

    const get = await fetch(await presignGet(key, 60));
    expect(get.status).toBe(200);
    expect(get.headers.get("content-type")).toBe("image/png");
    expect(Buffer.compare(Buffer.from(await get.arrayBuffer()), bytes)).toBe(0);
    expect(Buffer.compare(await getObjectBytes(key), bytes)).toBe(0);
  });

  it("signs Content-Type into the presigned PUT", async () => {
    // s3rver 3.7.1 accepts any SigV4 signature ("Signature version 4 calculation is unimplemented"
    // in its lib/middleware/authentication.js), so refusal can only be seen against real S3. What
    // can be checked here is the URL's contract: per AWS SigV4 query-string signing, headers named
    // in X-Amz-SignedHeaders must be sent unchanged or S3 answers 403 SignatureDoesNotMatch.
    const url = new URL(await presignPut(`${prefix}/typed.png`, "image/png", 60));
    expect(url.searchParams.get("X-Amz-SignedHeaders")?.split(";").sort()).toEqual(["content-type", "host"]);
  });

  it("fails with NoSuchKey for a missing key, and after deleteObject", async () => {
    const missing = getObjectBytes(`${prefix}/never-written.bin`);
    await expect(missing).rejects.toMatchObject({ name: "NoSuchKey", $metadata: { httpStatusCode: 404 } });

    const key = `${prefix}/to-delete.txt`;
    await putObject(key, Buffer.from("bye"), "text/plain");
    expect((await getObjectBytes(key)).toString()).toBe("bye");
    await deleteObject(key);
    const err = await getObjectBytes(key).catch((e: unknown) => e);
    expect(isMissing(err)).toBe(true);
  });

  it("ensureBucket is idempotent", async () => {
    await ensureBucket();
    await ensureBucket();
    const key = `${prefix}/after-ensure.txt`;
    await putObject(key, Buffer.from("still here"), "text/plain");
    expect((await getObjectBytes(key)).toString()).toBe("still here");
  });
});
