// The policy proxy.ts sends (Next.js "Content Security Policy" guide; OWASP ASVS 4.0 V14.4).
import { describe, expect, it } from "vitest";
import { contentSecurityPolicy, FIXED_HEADERS, permissionsPolicy } from "@/lib/security-headers";

const base = { nonce: "abc123", storageOrigin: "https://files.example.org", https: true };

describe("contentSecurityPolicy", () => {
  it("runs scripts by nonce only, forbids framing and plugins, and reaches the photo store", () => {
    const csp = contentSecurityPolicy({ ...base, dev: false });
    expect(csp).toContain("script-src 'self' 'nonce-abc123' 'strict-dynamic'");
    expect(csp).not.toContain("'unsafe-eval'");
    expect(csp).not.toMatch(/script-src[^;]*'unsafe-inline'/);
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).toContain("object-src 'none'");
    expect(csp).toContain("connect-src 'self' https://files.example.org");
    expect(csp).toContain("worker-src 'self'");
    expect(csp).toContain("upgrade-insecure-requests");
  });

  it("allows eval only in development, and upgrades requests only over HTTPS", () => {
    expect(contentSecurityPolicy({ ...base, dev: true })).toContain("'unsafe-eval'");
    expect(contentSecurityPolicy({ ...base, dev: false, https: false })).not.toContain("upgrade-insecure-requests");
  });
});

describe("fixed headers", () => {
  it("deny framing and sniffing, and keep the camera off except where asked", () => {
    const byKey = Object.fromEntries(FIXED_HEADERS.map((h) => [h.key, h.value]));
    expect(byKey["X-Frame-Options"]).toBe("DENY");
    expect(byKey["X-Content-Type-Options"]).toBe("nosniff");
    expect(byKey["Referrer-Policy"]).toBe("strict-origin-when-cross-origin");
    expect(byKey["Permissions-Policy"]).toContain("camera=()");
    expect(permissionsPolicy(true)).toContain("camera=(self)");
  });
});
