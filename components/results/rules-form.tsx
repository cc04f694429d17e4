"use client";
// The show's result rules: what ranks entries, the tie-break chain in order, places, minimum
// scores, rules by category size, how a tie is handled, honorable mentions, and the ribbons.
// Lists are typed as short text ("3:1, 6:2") and turned into the rules the server checks again.
import { Save } from "lucide-react";
import { z } from "zod";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import { Button } from "@/components/ui/button";
import { FieldError, SelectField, TextField } from "@/components/ui/field";
import type { ResultRules, TieBreakRule } from "@/scoring/results";
import { saveResultRulesAction } from "@/app/(chair)/shows/[slug]/manage/results/actions";

const TIE_WORDS = {
  shareWithinCount: "Tied entries share the place; no more ribbons than places (a tie for 2nd means no 3rd)",
  shareAndSkip: "Tied entries share the place and the next places are skipped (two 1sts → no 2nd)",
  shareNoSkip: "Tied entries share the place; the next entry takes the next place (1st, 1st, 2nd, 3rd)",
} as const;

const num = (what: string) => z.coerce.number({ error: `${what}: a number.` });

function parseList<T>(text: string, one: (part: string) => T | null, ctx: z.RefinementCtx, message: string): T[] {
  const parts = text.split(",").map((p) => p.trim()).filter(Boolean);
  const out = parts.map(one);
  if (out.some((x) => x === null)) ctx.addIssue({ code: "custom", message });
  return out.filter((x): x is T => x !== null);
}

const formSchema = z.object({
  rankBy: z.enum(["mean", "adjusted"]),
  chain: z.array(z.string()),
  places: num("Places").int().min(1).max(10),
  minimumScores: z.string().transform((t, ctx) => parseList(t, (p) => (p === "-" ? null : Number.isFinite(Number(p)) ? Number(p) : null), ctx, "Minimums: numbers separated by commas, e.g. 85, 80, 75.")),
  sizeRules: z.string().transform((t, ctx) =>
    parseList(t, (p) => { const m = /^(\d+)\s*:\s*(\d+)$/.exec(p); return m ? { maxEntries: Number(m[1]), places: Number(m[2]) } : null; }, ctx, "Size rules: “entries:places” pairs, e.g. 3:1, 6:2."),
  ),
  ties: z.enum(["shareAndSkip", "shareNoSkip", "shareWithinCount"]),
  honorableMentions: num("Honorable mentions").int().min(0).max(20),
  honorableMentionMinimum: z.string().transform((t, ctx) => { if (!t.trim()) return null; const n = Number(t); if (!Number.isFinite(n)) ctx.addIssue({ code: "custom", message: "A number, or leave it empty." }); return n; }),
  spreadFlag: num("Spread").min(0).max(1000),
  ribbonNames: z.array(z.string().trim().min(1, "Name each ribbon.")),
  ribbonColours: z.array(z.string()),
  hmName: z.string().trim().min(1, "Name the honorable mention ribbon."),
  hmColour: z.string(),
});

type Props = { showSlug: string; rules: ResultRules; sections: { id: string; title: string }[]; locked: boolean };

const chainValue = (t: TieBreakRule) => (t.kind === "section" ? `section:${t.sectionId}` : t.kind);

export function ResultRulesForm({ showSlug, rules, sections, locked }: Props) {
  const options = [
    ...sections.map((s) => ({ value: `section:${s.id}`, label: `Higher “${s.title}” score` })),
    { value: "firstPlaceVotes", label: "More judges placing it first" },
    { value: "median", label: "Higher median" },
    { value: "chair", label: "The chair's decision (recorded with a reason)" },
  ];
  const slots = 4;
  const RIBBONS = 10;
  const ctl = useActionForm({
    schema: formSchema,
    defaultValues: {
      rankBy: rules.rankBy, chain: Array.from({ length: slots }, (_, i) => (rules.tieBreaks[i] ? chainValue(rules.tieBreaks[i]!) : "")), places: rules.places,
      minimumScores: rules.minimumScores.map((m) => (m === null ? "-" : String(m))).join(", "), sizeRules: rules.sizeRules.map((r) => `${r.maxEntries}:${r.places}`).join(", "),
      ties: rules.ties, honorableMentions: rules.honorableMentions, honorableMentionMinimum: rules.honorableMentionMinimum === null ? "" : String(rules.honorableMentionMinimum), spreadFlag: rules.spreadFlag,
      ribbonNames: Array.from({ length: RIBBONS }, (_, i) => rules.ribbons.places[i]?.name ?? ""), ribbonColours: Array.from({ length: RIBBONS }, (_, i) => rules.ribbons.places[i]?.colour ?? "#888888"),
      hmName: rules.ribbons.honorableMention.name, hmColour: rules.ribbons.honorableMention.colour,
    },
    action: (v) => {
      const tieBreaks = v.chain.filter(Boolean).map((c): TieBreakRule => (c.startsWith("section:") ? { kind: "section", sectionId: c.slice(8), label: sections.find((s) => `section:${s.id}` === c)?.title ?? c.slice(8) } : { kind: c as "firstPlaceVotes" | "median" | "chair" }));
      const places = v.ribbonNames.slice(0, v.places).map((name, i) => ({ name, colour: v.ribbonColours[i] ?? "#888888" }));
      return saveResultRulesAction(null, {
        showSlug, rankBy: v.rankBy, tieBreaks, places: v.places, minimumScores: v.minimumScores, sizeRules: v.sizeRules, ties: v.ties, honorableMentions: v.honorableMentions,
        honorableMentionMinimum: v.honorableMentionMinimum, spreadFlag: v.spreadFlag, ribbons: { places, honorableMention: { name: v.hmName, colour: v.hmColour } },
      });
    },
  });
  const { register } = ctl.form;
  const ribbonSlots = Math.min(RIBBONS, Math.max(1, Number(ctl.form.watch("places")) || 1));
  return (
    <ActionForm controller={ctl} aria-label="Result rules" className="space-y-6">
      <fieldset className="space-y-1" disabled={locked}>
        <legend className="font-medium">What ranks the entries</legend>
        <label className="flex min-h-tap items-center gap-3"><input type="radio" value="mean" className="size-5 accent-plum-600" {...register("rankBy")} />The judges&apos; mean score</label>
        <label className="flex min-h-tap items-center gap-3"><input type="radio" value="adjusted" className="size-5 accent-plum-600" {...register("rankBy")} />The severity-adjusted score (each judge&apos;s scores standardised within the category)</label>
      </fieldset>
      <fieldset className="grid gap-3 sm:grid-cols-2" disabled={locked}>
        <legend className="mb-1 font-medium">Tie-breaks, in order</legend>
        {Array.from({ length: slots }, (_, i) => (
          <SelectField key={i} label={`Tie-break ${i + 1}`} optional {...register(`chain.${i}` as const)}>
            <option value="">—</option>
            {options.map((o) => <option key={o.value} value={o.value}>{o.label}</option>)}
          </SelectField>
        ))}
        <FieldError message={ctl.errorOf("chain")} />
      </fieldset>
      <fieldset className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3" disabled={locked}>
        <legend className="mb-1 font-medium">Places</legend>
        <TextField label="Places per category" type="number" inputMode="numeric" min={1} max={10} error={ctl.errorOf("places")} {...register("places")} />
        <TextField label="Minimum mean per place" hint="1st first, e.g. 85, 80, 75; “-” for none. Applies when ranking by the mean." optional error={ctl.errorOf("minimumScores")} {...register("minimumScores")} />
        <TextField label="Fewer places for small categories" hint="“entries:places”, e.g. 3:1, 6:2 (3 or fewer entries: 1st only)." optional error={ctl.errorOf("sizeRules")} {...register("sizeRules")} />
        <TextField label="Honorable mentions per category" hint="Given to the best unplaced entries; 0 if the judges name them (record them with Change)." type="number" inputMode="numeric" error={ctl.errorOf("honorableMentions")} {...register("honorableMentions")} />
        <TextField label="Minimum for an honorable mention" optional error={ctl.errorOf("honorableMentionMinimum")} {...register("honorableMentionMinimum")} />
        <TextField label="Flag judges this many points apart" type="number" inputMode="decimal" error={ctl.errorOf("spreadFlag")} {...register("spreadFlag")} />
      </fieldset>
      <fieldset className="space-y-1" disabled={locked}>
        <legend className="font-medium">A tie for a place</legend>
        {(Object.keys(TIE_WORDS) as (keyof typeof TIE_WORDS)[]).map((t) => (
          <label key={t} className="flex min-h-tap items-center gap-3"><input type="radio" value={t} className="size-5 accent-plum-600" {...register("ties")} />{TIE_WORDS[t]}</label>
        ))}
      </fieldset>
      <fieldset className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4" disabled={locked}>
        <legend className="mb-1 font-medium">Ribbons</legend>
        {Array.from({ length: ribbonSlots }, (_, i) => (
          <div key={i} className="flex items-end gap-2">
            <TextField label={`${i + 1}${["st", "nd", "rd"][i] ?? "th"} place`} error={ctl.form.formState.errors.ribbonNames?.[i]?.message} {...register(`ribbonNames.${i}` as const)} />
            <input type="color" aria-label={`Colour of the ${i + 1}${["st", "nd", "rd"][i] ?? "th"}-place ribbon`} className="h-tap w-14 rounded-control border border-line" {...register(`ribbonColours.${i}` as const)} />
          </div>
        ))}
        <div className="flex items-end gap-2">
          <TextField label="Honorable mention" error={ctl.errorOf("hmName")} {...register("hmName")} />
          <input type="color" aria-label="Colour of the honorable mention ribbon" className="h-tap w-14 rounded-control border border-line" {...register("hmColour")} />
        </div>
      </fieldset>
      {locked ? <p className="text-ink-muted">The results are published; unpublish them to change the rules.</p> : (
        <Button type="submit" pending={ctl.pending} pendingLabel="Saving…" icon={<Save aria-hidden className="size-5" />}>Save result rules</Button>
      )}
    </ActionForm>
  );
}
