// Receives the payments provider's webhook: verifies the signature over the raw body, records the
// event once, applies it in the same transaction, and mails the receipt after the commit.
import { applyPaymentEvent, recordCardDetails, recordPaymentEvent } from "@/db/queries/payments";
import { sendPaymentReceiptMail } from "@/lib/entry-mails";
import { verifyWebhook, WebhookSignatureError } from "@/lib/payments";
import { webhookEventSchema } from "@/lib/schemas/payments";
import { errorSummary } from "@/lib/error-log";

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
  if (!webhookEventSchema.safeParse(event).success) {
    return Response.json({ error: "invalid_event", message: "The event does not have the shape of a payments event." }, { status: 400 });
  }
  const applied: { paidPaymentId: string | null } = { paidPaymentId: null };
  const { duplicate } = await recordPaymentEvent(event, async (tx, ev) => {
    applied.paidPaymentId = (await applyPaymentEvent(tx, ev)).paidPaymentId;
  });
  const { paidPaymentId } = applied;
  if (paidPaymentId) {
    // The payment is committed either way; a failed mail must not make the provider redeliver
    // (the redelivery would be a duplicate and send nothing), so log it for the show to follow up.
    // The card's brand and last digits for the receipt; without them the receipt just says "card".
    await recordCardDetails(paidPaymentId).catch((err: unknown) => console.error("[webhook] card details not read", { paidPaymentId, err: errorSummary(err) }));
    await sendPaymentReceiptMail(paidPaymentId).catch((err: unknown) => console.error("[webhook] receipt mail failed", { paidPaymentId, err: errorSummary(err) }));
  }
  return Response.json({ received: true, duplicate });
}
