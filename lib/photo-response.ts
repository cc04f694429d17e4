// A photo's bytes as a response: private to this browser and brief, because access can be taken
// away (a role removed, results taken down); keys are never reused.
export function photoResponse(bytes: Uint8Array | Buffer, contentType: string): Response {
  return new Response(new Uint8Array(bytes), {
    headers: {
      "content-type": contentType,
      "content-length": String(bytes.length),
      "cache-control": "private, max-age=300",
      "x-content-type-options": "nosniff",
    },
  });
}
