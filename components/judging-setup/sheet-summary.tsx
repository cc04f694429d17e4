"use client";
// The live side panel of the sheet editor: the nominal total (Σ most points × weight), what
// checkSheet says about the sheet, and a "try it" total for sample marks, all in the browser.
import { useMemo, useState } from "react";
import { useWatch, type Control } from "react-hook-form";
import { CircleCheck, TriangleAlert } from "lucide-react";
import { FieldError } from "@/components/ui/field";
import { checkSheet, formatScore, sheetTotal, type Mark, type ScoreSheet, type SheetCheck } from "@/scoring/score-sheets";
import { formToSheet, type SheetForm, type SheetOutput } from "./sheet-model";

// Blank level shares are named beside the field; checkSheet's version of it would only repeat it.
const shown = (check: SheetCheck) => check.problems.filter((p) => !/of the points; it must be between 0 and 1/.test(p.text));

function useSheetCheck(control: Control<SheetForm, unknown, SheetOutput>) {
  const watched = useWatch({ control, name: "sheet" });
  const sheet = useMemo(() => formToSheet(watched), [watched]);
  const check = useMemo<SheetCheck | null>(() => {
    try {
      return checkSheet(sheet);
    } catch {
      return null;
    }
  }, [sheet]);
  return { sheet, check };
}

/** One line for narrow screens: the total and how many things need attention. */
export function SheetTotalBar({ control }: { control: Control<SheetForm, unknown, SheetOutput> }) {
  const { check } = useSheetCheck(control);
  const problems = check ? shown(check) : [];
  const good = check && check.nominalMax === 100 && problems.length === 0;
  return (
    <p className="flex items-center gap-2 font-semibold" aria-hidden>
      {good ? <CircleCheck aria-hidden className="size-5 text-success-700" /> : <TriangleAlert aria-hidden className="size-5 text-warning-700" />}
      Total {check ? formatScore(check.nominalMax) : "—"}
      {problems.length ? <span className="font-normal text-danger-700">· {problems.length === 1 ? "1 thing" : `${problems.length} things`} to fix (listed below)</span> : null}
    </p>
  );
}

export function SheetSummary({ control, serverError }: { control: Control<SheetForm, unknown, SheetOutput>; serverError?: string }) {
  const { sheet, check } = useSheetCheck(control);
  const problems = check ? shown(check) : [];
  const total = check ? formatScore(check.nominalMax) : "—";
  return (
    <div className="space-y-4">
      <div className="rounded-control border border-line bg-paper-50 p-4" aria-live="polite">
        <p className="flex items-center gap-2 text-2xl font-semibold" data-testid="sheet-total">
          {check && check.nominalMax === 100 && problems.length === 0 ? <CircleCheck aria-hidden className="size-6 text-success-700" /> : <TriangleAlert aria-hidden className="size-6 text-warning-700" />}
          Total {total}
        </p>
        {check?.notes.length ? (
          <ul className="mt-2 space-y-1 text-sm text-warning-700">
            {check.notes.map((n) => (
              <li key={n}>{n}</li>
            ))}
          </ul>
        ) : null}
        {problems.length ? (
          <div className="mt-2">
            <p className="text-sm font-semibold text-danger-700">Before it can be saved:</p>
            <ul className="list-disc space-y-1 pl-5 text-sm text-danger-700">
              {problems.slice(0, 6).map((p) => (
                <li key={`${p.criterionId ?? p.sectionId ?? ""}${p.text}`}>{p.text}</li>
              ))}
            </ul>
          </div>
        ) : null}
        <FieldError message={serverError} />
      </div>
      {check?.ok ? <TryIt sheet={sheet} /> : null}
    </div>
  );
}

/** Sample marks for each criterion and the total they give, N/A rescaled. */
function TryIt({ sheet }: { sheet: ScoreSheet }) {
  const [marks, setMarks] = useState<Record<string, Mark | undefined>>({});
  const result = useMemo(() => {
    try {
      return sheetTotal(sheet, marks, { partial: true });
    } catch {
      return null;
    }
  }, [sheet, marks]);
  const set = (id: string, m: Mark | undefined) => setMarks((x) => ({ ...x, [id]: m }));
  return (
    <details className="rounded-control border border-line p-4">
      <summary className="min-h-tap cursor-pointer font-semibold">Try it with sample marks</summary>
      <div className="mt-3 space-y-2">
        {sheet.sections.flatMap((s) =>
          s.criteria.map((c) => {
            const m = marks[c.id];
            const value = m?.kind === "na" ? "na" : m?.kind === "word" ? m.level : m?.kind === "points" ? String(m.points) : "";
            const id = `try-${c.id}`;
            return (
              <div key={c.id} className="grid grid-cols-[minmax(0,1fr)_7rem] items-center gap-2">
                <label htmlFor={id} className="text-sm">
                  {c.label || c.id}
                </label>
                {c.scale.kind === "words" ? (
                  <select id={id} className="min-h-tap rounded-control border border-line-strong bg-white px-2" value={value} onChange={(e) => set(c.id, e.target.value === "" ? undefined : e.target.value === "na" ? { kind: "na" } : { kind: "word", level: e.target.value })}>
                    <option value="">—</option>
                    {c.scale.levels.map((l) => (
                      <option key={l.label} value={l.label}>
                        {l.label}
                      </option>
                    ))}
                    {c.allowNotApplicable ? <option value="na">N/A</option> : null}
                  </select>
                ) : (
                  <input
                    id={id}
                    inputMode="decimal"
                    placeholder={c.allowNotApplicable ? "N/A or pts" : `0–${c.maxPoints}`}
                    className="min-h-tap w-full rounded-control border border-line-strong bg-white px-2"
                    defaultValue={value}
                    onChange={(e) => {
                      const t = e.target.value.trim();
                      if (t === "") set(c.id, undefined);
                      else if (/^n\/?a$/i.test(t)) set(c.id, { kind: "na" });
                      else set(c.id, { kind: "points", points: Number(t.replace(",", ".")) });
                    }}
                  />
                )}
              </div>
            );
          }),
        )}
        <p className="pt-2 font-semibold" aria-live="polite">
          {result && result.total !== null ? `Sample total ${formatScore(result.total)} of ${formatScore(result.nominalMax)}${result.complete ? "" : " so far"}` : "Give a mark to see a total."}
        </p>
        {result?.invalid.length ? (
          <ul className="space-y-1 text-sm text-danger-700">
            {result.invalid.map((p) => (
              <li key={p.criterionId}>{p.text}</li>
            ))}
          </ul>
        ) : null}
      </div>
    </details>
  );
}
