"use server";
// The chair's category actions: save the set (moves shown first, then confirmed), place an entry
// by hand, mark a size flag reviewed, give a waiting entry its place, and the intake tolerance.
// Each query checks the chair role and the judging lock itself.
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { storableString } from "@/lib/validation";
import { saveCategorySet, type SaveSetResult } from "@/db/queries/categories";
import { admitFromWaitlist, overrideEntryCategory, reviewSizeFlag, updateSizeTolerance } from "@/db/queries/category-queue";
import { defineAction } from "@/lib/action";
import { admitSchema, categorySetSchema, overrideSchema, reviewSizeSchema, toleranceSchema } from "@/lib/schemas/categories";
import { formatInches } from "@/scoring/units";
import { plural } from "@/scoring/words";

const showSlug = storableString().min(1, "The show is missing.").max(120);
const withSlug = <S extends z.ZodType>(schema: S) => z.intersection(schema, z.object({ showSlug }));

function refresh(slug: string) {
  revalidatePath(`/shows/${slug}/manage/categories`);
  revalidatePath(`/shows/${slug}/manage/entries`);
  revalidatePath(`/shows/${slug}/manage`);
}

const saveSchema = withSlug(categorySetSchema);

export const saveCategoriesAction = defineAction<typeof saveSchema, SaveSetResult>(saveSchema, async (input, viewer) => {
  const { showSlug: slug, ...set } = input;
  const result: SaveSetResult = await saveCategorySet(viewer, slug, set);
  if (!result.saved) {
    const n = result.moves.length;
    return {
      message: result.stale
        ? `The entries changed since you looked: saving now would move ${plural(n, "entry", "entries")}. Check the moves again.`
        : `Saving would move ${plural(n, "entry", "entries")}. Check the moves, then apply them.`,
      data: result,
    };
  }
  refresh(slug);
  const moved = result.moved ? ` ${plural(result.moved, "entry", "entries")} moved.` : "";
  return { message: `${plural(result.categories, "category", "categories")} saved.${moved}`, data: result };
});

export const overrideCategoryAction = defineAction(withSlug(overrideSchema), async (input, viewer) => {
  const { showSlug: slug, ...rest } = input;
  const r = await overrideEntryCategory(viewer, slug, rest);
  refresh(slug);
  const where = rest.categoryId === "rules" ? `back with the rules: ${r.category}` : `placed in ${r.category.replace(/ \(chair's choice\)$/, "")}`;
  return { message: `#${r.entryNumber} ${where}.` };
});

export const reviewSizeFlagAction = defineAction(withSlug(reviewSizeSchema), async (input, viewer) => {
  const { showSlug: slug, ...rest } = input;
  const r = await reviewSizeFlag(viewer, slug, rest);
  refresh(slug);
  return { message: `#${r.entryNumber}: size flag marked reviewed.` };
});

export const admitFromWaitlistAction = defineAction(withSlug(admitSchema), async (input, viewer) => {
  const { showSlug: slug, ...rest } = input;
  const r = await admitFromWaitlist(viewer, slug, rest);
  refresh(slug);
  return { message: `#${r.entryNumber} has its place.` };
});

export const updateToleranceAction = defineAction(withSlug(toleranceSchema), async (input, viewer) => {
  const { showSlug: slug, ...rest } = input;
  const r = await updateSizeTolerance(viewer, slug, rest);
  refresh(slug);
  return { message: `Intake tolerance saved: within ${formatInches(r.toleranceUm)} (${(r.toleranceUm / 10_000).toFixed(1)} cm) of the registered size.` };
});
