// The envelope of a payments webhook event we rely on. The signature proves who sent it, not that
// it has the shape we read: an event without `data`, with a `created` that is not a number, or a
// signed array is refused with 400 instead of failing half-way into the database.
import { z } from "zod";
import { findUnstorable, storableString } from "@/lib/validation";

/** 9999-12-31T23:59:59Z in Unix seconds: the last instant a JavaScript Date and timestamptz both hold. */
const LAST_SECOND = 253_402_300_799;

export const webhookEventSchema = z
  .looseObject({
    id: storableString().min(1).max(255),
    type: storableString().min(1).max(255),
    created: z.number("created must be a Unix time in seconds.").int().min(0).max(LAST_SECOND),
    // Most provider objects have an id (a balance, for one, has none); the ones we apply must.
    data: z.looseObject({ object: z.looseObject({ id: storableString().min(1).max(255).optional() }) }),
  })
  // The whole event is stored as jsonb, which can hold no NUL and no lone surrogate.
  .superRefine((event, ctx) => {
    if (event.type.startsWith("checkout.session.") && event.data.object.id === undefined) {
      ctx.addIssue({ code: "custom", path: ["data", "object", "id"], message: "A checkout session event names its session." });
    }
    const bad = findUnstorable(event);
    if (bad) ctx.addIssue({ code: "custom", path: bad.path === "_form" ? [] : bad.path.split("."), message: bad.message });
  });
