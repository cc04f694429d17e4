// The payments provider (Stripe's API, or the local fake when STRIPE_API_HOST points at it) and webhook checks.
import "server-only";
import Stripe from "stripe";
import { env } from "@/lib/env";

// An empty STRIPE_API_HOST means "the real API": leave host/port/protocol to the SDK's defaults.
export const stripe = new Stripe(env.STRIPE_SECRET_KEY, {
  appInfo: { name: "Ribbonry" },
  ...(env.STRIPE_API_HOST
    ? { host: env.STRIPE_API_HOST, port: env.STRIPE_API_PORT, protocol: env.STRIPE_API_PROTOCOL }
    : {}),
});

export class WebhookSignatureError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "WebhookSignatureError";
  }
}

/** Checks the Stripe-Signature header against the raw body (byte for byte) and returns the event. */
export function verifyWebhook(rawBody: string, signature: string | null): Stripe.Event {
  if (!signature) throw new WebhookSignatureError("The Stripe-Signature header is missing.");
  try {
    return stripe.webhooks.constructEvent(rawBody, signature, env.STRIPE_WEBHOOK_SECRET);
  } catch (err) {
    // A valid signature over a body that is not JSON lands here too; both mean "do not trust it".
    throw new WebhookSignatureError(err instanceof Error ? err.message : "The webhook signature could not be verified.");
  }
}
