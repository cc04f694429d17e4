// Receives the payments provider's webhook: verifies the signature over the raw body, then records the event.
import { recordPaymentEvent } from "@/db/queries/payments";
import { verifyWebhook, WebhookSignatureError } from "@/lib/payments";

// The Stripe SDK's signature check uses node:crypto.
export const runtime = "nodejs";

export async function POST(req: Request): Promise<Response> {
  // The signature covers the exact bytes, so read text: parsing and re-serialising would break it.
  const body = await req.text();
  let event;
  try {
    event = verifyWebhook(body, req.headers.get("stripe-signature"));
  } catch (err) {
    if (err instanceof WebhookSignatureError) {
      return Response.json({ error: "invalid_signature", message: err.message }, { status: 400 });
    }
    throw err;
  }
  const { duplicate } = await recordPaymentEvent(event);
  return Response.json({ received: true, duplicate });
}
