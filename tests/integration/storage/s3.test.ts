// Photo storage against the local S3 fake: bytes survive a round trip unchanged (buffered and
// streamed), a presigned form POST and a presigned GET work from plain fetch, the POST policy
// binds the size and type, a capped read stops at its limit, and a missing key is an error.
import { createHash, randomBytes, randomUUID } from "node:crypto";
import { Readable } from "node:stream";
import { GetObjectCommand, PutObjectCommand } from "@aws-sdk/client-s3";
import { beforeAll, describe, expect, it } from "vitest";
import { env } from "@/lib/env";
import { deleteObject, ensureBucket, getObjectBytes, getObjectBytesUpTo, isMissing, ObjectTooLarge, objectSize, presignGet, presignPost, putObject, s3 } from "@/storage/s3";

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

  it("accepts a presigned form POST from fetch and serves it back through a presigned GET", async () => {
    const bytes = randomBytes(64 * 1024);
    const key = `${prefix}/presigned photo.png`; // a space: the key travels as a form field
    const { url, fields } = await presignPost(key, "image/png", 100_000, 60);
    // Path-style: the bucket's own URL on the storage origin, which the browser posts to.
    expect(url).toBe(`${env.S3_ENDPOINT}/${env.S3_BUCKET}`);
    const form = new FormData();
    for (const [name, value] of Object.entries(fields)) form.append(name, value);
    form.append("file", new Blob([bytes], { type: "image/png" }), "photo.png"); // the file last (AWS S3 POST Object)
    const post = await fetch(url, { method: "POST", body: form });
    expect(post.status).toBe(204);

    const get = await fetch(await presignGet(key, 60));
    expect(get.status).toBe(200);
    expect(get.headers.get("content-type")).toBe("image/png");
    expect(Buffer.compare(Buffer.from(await get.arrayBuffer()), bytes)).toBe(0);
    expect(await objectSize(key)).toBe(bytes.length);
  });

  it("signs a policy that binds the key, the type and the size range", async () => {
    // s3rver 3.7.1 ignores the policy field ("unimplemented" in its controllers/object.js), so a
    // refusal can only be seen against real S3. What can be checked here is the policy's contract:
    // AWS S3 API reference, "Creating a POST policy": every condition must hold or S3 answers 403,
    // and content-length-range bounds the file's size in bytes, inclusive.
    const key = `${prefix}/typed.png`;
    const { fields } = await presignPost(key, "image/png", 400_000, 60);
    const policy = JSON.parse(Buffer.from(fields.Policy!, "base64").toString("utf8")) as { expiration: string; conditions: unknown[] };
    expect(policy.conditions).toEqual(
      expect.arrayContaining([["content-length-range", 1, 400_000], { "Content-Type": "image/png" }, { key }, { bucket: env.S3_BUCKET }]),
    );
    expect(Date.parse(policy.expiration) - Date.now()).toBeLessThanOrEqual(60_000);
    expect(fields["X-Amz-Algorithm"]).toBe("AWS4-HMAC-SHA256");
    expect(fields["X-Amz-Signature"]).toMatch(/^[0-9a-f]{64}$/);
  });

  it("reads an object up to a limit and stops past it", async () => {
    const key = `${prefix}/capped.bin`;
    const bytes = randomBytes(200 * 1024);
    await putObject(key, bytes, "application/octet-stream");
    expect(Buffer.compare(await getObjectBytesUpTo(key, bytes.length), bytes)).toBe(0);
    const err = await getObjectBytesUpTo(key, 50 * 1024).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ObjectTooLarge);
    expect((err as ObjectTooLarge).bytesSeen).toBeLessThan(bytes.length);
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
