// The signed-in person's entrant profile.
import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { entrantProfiles } from "@/db/schema";
import { writeAudit } from "@/db/queries/audit";
import type { profileSchema } from "@/lib/schemas/profile";
import type { Viewer } from "@/lib/session";
import type { z } from "zod";

const columns = {
  displayName: entrantProfiles.displayName,
  phone: entrantProfiles.phone,
  addressLine1: entrantProfiles.addressLine1,
  addressLine2: entrantProfiles.addressLine2,
  city: entrantProfiles.city,
  region: entrantProfiles.region,
  postalCode: entrantProfiles.postalCode,
  country: entrantProfiles.country,
  guild: entrantProfiles.guild,
  publishNameConsent: entrantProfiles.publishNameConsent,
};

export async function profileFor(viewer: Viewer) {
  const [row] = await db.select(columns).from(entrantProfiles).where(eq(entrantProfiles.userId, viewer.id));
  return (
    row ?? {
      displayName: viewer.name,
      phone: "",
      addressLine1: "",
      addressLine2: "",
      city: "",
      region: "",
      postalCode: "",
      country: "",
      guild: "",
      publishNameConsent: false,
    }
  );
}

export async function saveProfile(viewer: Viewer, input: z.output<typeof profileSchema>) {
  await db.transaction(async (tx) => {
    const [before] = await tx.select(columns).from(entrantProfiles).where(eq(entrantProfiles.userId, viewer.id)).for("update");
    await tx
      .insert(entrantProfiles)
      .values({ userId: viewer.id, ...input, updatedAt: new Date() })
      .onConflictDoUpdate({ target: entrantProfiles.userId, set: { ...input, updatedAt: new Date() } });
    await writeAudit(tx, {
      actorUserId: viewer.id,
      showId: null,
      action: before ? "profile.updated" : "profile.created",
      subjectType: "user",
      subjectId: viewer.id,
      // Why: the log records which fields changed, not the personal data itself.
      before: before ? { fields: Object.keys(before) } : null,
      after: { changed: before ? Object.keys(input).filter((k) => before[k as keyof typeof before] !== input[k as keyof typeof input]) : Object.keys(input) },
    });
  });
}
