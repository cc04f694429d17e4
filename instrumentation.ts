// Runs once when the Next.js server starts (Next's instrumentation hook). Node runtime only:
// record each request's socket address for lib/client-address.ts, and keep query parameters out
// of the errors Next.js logs itself (lib/log-redaction.ts).
export async function register() {
  // NEXT_RUNTIME is set by Next itself, not configuration, so it is read here and not in lib/env.ts.
  if (process.env.NEXT_RUNTIME === "nodejs") {
    const { watchPeerAddresses } = await import("@/lib/client-address");
    watchPeerAddresses();
    const { installLogRedaction } = await import("@/lib/log-redaction");
    installLogRedaction();
  }
}
