// The origins the app itself is served from: better-auth trusts them for its own endpoints and
// lib/api.ts accepts state-changing requests only from them (OWASP CSRF Prevention Cheat Sheet:
// verify the Origin header against the target origin).
import { env } from "@/lib/env";

export function trustedOrigins(appUrl: string = env.APP_URL): string[] {
  const url = new URL(appUrl);
  const port = url.port ? `:${url.port}` : "";
  // The same server answers on localhost and 127.0.0.1; accept both spellings of it.
  return [url.origin, `${url.protocol}//localhost${port}`, `${url.protocol}//127.0.0.1${port}`];
}
