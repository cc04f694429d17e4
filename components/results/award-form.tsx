"use client";
// Adding or editing a show-wide award: kind, name, sponsor, who picks the winner, the ribbon,
// who may win it (category winners only, quilting method, large or small by perimeter, divisions),
// whether the winner keeps its category place, and which other awards it may be held with.
import { z } from "zod";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import { Button } from "@/components/ui/button";
import { CheckboxField, SelectField, TextField } from "@/components/ui/field";
import { AWARD_KIND_LABELS, defaultEligibility, type AwardDefinition, type AwardKind } from "@/scoring/awards";
import { UM_PER_INCH } from "@/scoring/units";
import { saveAwardAction } from "@/app/(chair)/shows/[slug]/manage/results/actions";

const KINDS = Object.keys(AWARD_KIND_LABELS) as AwardKind[];
const METHODS = [["hand", "Hand quilted"], ["home_machine", "Home machine"], ["frame_machine", "Frame machine"]] as const;

const formSchema = z.object({
  kind: z.enum(KINDS as [AwardKind, ...AwardKind[]]),
  name: z.string().trim().min(1, "Name the award."),
  sponsor: z.string().trim(),
  chooseBy: z.enum(["chair", "judges_vote"]),
  ribbonName: z.string().trim().min(1, "Name the ribbon, e.g. Purple rosette."),
  ribbonColour: z.string(),
  winnersOnly: z.boolean(),
  methods: z.array(z.string()),
  sizeSide: z.enum(["", "large", "small"]),
  perimeterIn: z.string().refine((t) => t === "" || Number(t) > 0, "Give the perimeter in inches, e.g. 240."),
  keepsCategoryPlace: z.boolean(),
  combinesWith: z.array(z.string()),
});

type Props = { showSlug: string; award?: AwardDefinition; others: { id: string; name: string }[]; onDone?: () => void };

export function AwardForm({ showSlug, award, others, onDone }: Props) {
  const e = award?.eligibility ?? defaultEligibility("best_of_show");
  const ctl = useActionForm({
    schema: formSchema,
    defaultValues: {
      kind: award?.kind ?? "best_of_show", name: award?.name ?? "Best of Show", sponsor: award?.sponsor ?? "", chooseBy: award?.chooseBy ?? "judges_vote",
      ribbonName: award?.ribbon.name ?? "Purple rosette", ribbonColour: award?.ribbon.colour ?? "#6b21a8", winnersOnly: !!e.categoryWinnersOnly, methods: [...(e.quiltingMethods ?? [])],
      sizeSide: e.size?.side ?? "", perimeterIn: e.size ? String(Math.round(e.size.perimeterUm / UM_PER_INCH)) : "", keepsCategoryPlace: award?.keepsCategoryPlace ?? true, combinesWith: [...(award?.combinesWith ?? [])],
    },
    resetOnSuccess: !award,
    onSuccess: onDone,
    action: (v) =>
      saveAwardAction(null, {
        showSlug, id: award?.id, kind: v.kind, name: v.name, sponsor: v.sponsor, chooseBy: v.kind === "judges_choice" ? "chair" : v.chooseBy, ribbon: { name: v.ribbonName, colour: v.ribbonColour },
        eligibility: {
          ...(v.winnersOnly ? { categoryWinnersOnly: true } : {}),
          ...(v.methods.length ? { quiltingMethods: v.methods as ("hand" | "home_machine" | "frame_machine")[] } : {}),
          ...(v.sizeSide && v.perimeterIn ? { size: { side: v.sizeSide, perimeterUm: Math.round(Number(v.perimeterIn) * UM_PER_INCH) } } : {}),
          ...(award?.eligibility.categoryIds ? { categoryIds: award.eligibility.categoryIds } : {}),
          ...(award?.eligibility.divisions ? { divisions: award.eligibility.divisions } : {}),
        },
        keepsCategoryPlace: v.keepsCategoryPlace, combinesWith: v.combinesWith,
      }),
  });
  const { register, setValue } = ctl.form;
  const kind = ctl.form.watch("kind");
  const onKind = (k: AwardKind) => {
    if (award) return;
    const d = defaultEligibility(k);
    setValue("name", AWARD_KIND_LABELS[k]);
    setValue("winnersOnly", !!d.categoryWinnersOnly);
    setValue("methods", [...(d.quiltingMethods ?? [])]);
    setValue("chooseBy", k === "best_of_show" ? "judges_vote" : "chair");
  };
  return (
    <ActionForm controller={ctl} aria-label={award ? `Edit ${award.name}` : "Add an award"} className="space-y-4 rounded-control border border-line bg-paper-50 p-3 sm:p-4">
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        <SelectField label="Kind" error={ctl.errorOf("kind")} {...register("kind", { onChange: (ev) => onKind(ev.target.value as AwardKind) })}>
          {KINDS.map((k) => <option key={k} value={k}>{AWARD_KIND_LABELS[k]}</option>)}
        </SelectField>
        <TextField label="Name" hint="As printed on the ribbon and the results, e.g. Best of Show — Large." error={ctl.errorOf("name")} {...register("name")} />
        {kind === "sponsor" ? <TextField label="Sponsor" error={ctl.errorOf("sponsor")} {...register("sponsor")} /> : null}
        {kind === "judges_choice" ? (
          <p className="text-sm text-ink-muted sm:col-span-2">Each judge chooses one entry; record each judge&apos;s choice below.</p>
        ) : (
          <SelectField label="Who picks the winner" error={ctl.errorOf("chooseBy")} {...register("chooseBy")}>
            <option value="judges_vote">The judges&apos; vote (a tie goes to the chair)</option>
            <option value="chair">The chair</option>
          </SelectField>
        )}
        <div className="flex items-end gap-2">
          <TextField label="Ribbon" error={ctl.errorOf("ribbonName")} {...register("ribbonName")} />
          <input type="color" aria-label="Ribbon colour" className="h-tap w-14 rounded-control border border-line" {...register("ribbonColour")} />
        </div>
      </div>
      <fieldset className="grid gap-2 sm:grid-cols-2">
        <legend className="mb-1 font-medium">Who may win it</legend>
        <CheckboxField label="Only entries that won 1st in their category" {...register("winnersOnly")} />
        {METHODS.map(([value, label]) => <CheckboxField key={value} label={label} value={value} {...register("methods")} />)}
        <SelectField label="Size" optional {...register("sizeSide")}>
          <option value="">Any size</option>
          <option value="large">Large: perimeter at least…</option>
          <option value="small">Small: perimeter under…</option>
        </SelectField>
        <TextField label="Perimeter (inches)" inputMode="decimal" optional error={ctl.errorOf("perimeterIn")} {...register("perimeterIn")} />
      </fieldset>
      <fieldset className="grid gap-2 sm:grid-cols-2">
        <legend className="mb-1 font-medium">Holding it with other ribbons</legend>
        <CheckboxField label="The winner keeps its category place" hint="Unticked: the winner leaves its category's placings and the next entries move up." {...register("keepsCategoryPlace")} />
        {others.map((o) => <CheckboxField key={o.id} label={`May also hold ${o.name}`} value={o.id} {...register("combinesWith")} />)}
      </fieldset>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" pending={ctl.pending} pendingLabel="Saving…">{award ? "Save the award" : "Add the award"}</Button>
        {onDone ? <Button variant="ghost" onClick={onDone}>Cancel</Button> : null}
      </div>
    </ActionForm>
  );
}
