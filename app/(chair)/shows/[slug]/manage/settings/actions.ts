"use server";
// The chair's settings actions: dates, one settings section at a time, rules versions, status.
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { storableString } from "@/lib/validation";
import { changeShowStatus, publishRules, STATUS_WORDS, updateShowDates, updateShowSettings } from "@/db/queries/settings";
import { defineAction } from "@/lib/action";
import { datesSchema, publishRulesSchema, settingsSectionSchema, statusChangeSchema } from "@/lib/schemas/settings";

const showSlug = storableString().min(1, "The show is missing.").max(120);
const withSlug = <S extends z.ZodType>(schema: S) => z.intersection(schema, z.object({ showSlug }));

function refresh(slug: string) {
  revalidatePath(`/shows/${slug}/manage/settings`);
  revalidatePath(`/shows/${slug}/manage`);
  revalidatePath(`/shows/${slug}`);
}

export const updateDatesAction = defineAction(withSlug(datesSchema), async (input, viewer) => {
  const { showSlug: slug, ...dates } = input;
  await updateShowDates(viewer, slug, dates);
  refresh(slug);
  return { message: "Dates saved." };
});

export const updateSettingsAction = defineAction(withSlug(settingsSectionSchema), async (input, viewer) => {
  const { showSlug: slug, ...section } = input;
  const { label } = await updateShowSettings(viewer, slug, section);
  refresh(slug);
  return { message: `${label} saved.` };
});

export const publishRulesAction = defineAction(withSlug(publishRulesSchema), async (input, viewer) => {
  const { showSlug: slug, ...rules } = input;
  const { version } = await publishRules(viewer, slug, rules);
  refresh(slug);
  return { message: `Version ${version} of the rules and release is published.`, data: { version } };
});

export const changeStatusAction = defineAction(withSlug(statusChangeSchema), async (input, viewer) => {
  const { to } = await changeShowStatus(viewer, input.showSlug, { status: input.status, reason: input.reason });
  refresh(input.showSlug);
  return { message: `The show is now ${STATUS_WORDS[to]}.` };
});
