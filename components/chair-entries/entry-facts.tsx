// The facts of one entry for the chair, as a definition list: sizes in both units, makers,
// quilting, pattern credit, statement, value and sale price.
import type { ReactNode } from "react";
import { DIVISION_LABELS, QUILTING_METHOD_LABELS, labelOf } from "@/components/entries/labels";
import { formatDateTime } from "@/components/format/dates";
import { formatSize, formatInches } from "@/scoring/units";
import { categoryText, type CategoryOfEntry } from "@/lib/category-text";

export type EntryFacts = CategoryOfEntry & {
  widthUm: number;
  lengthUm: number;
  sizeUnit: string;
  techniques: string[];
  madeBy: string[];
  quiltedBy: string;
  quiltedForHire: boolean;
  quiltingMethod: string;
  patternSource: string;
  patternName: string;
  patternDesigner: string;
  statement: string;
  declaredValueCents: number;
  forSale: boolean;
  priceCents: number | null;
  division: string;
  youthAge: number | null;
  judged: boolean;
  critiqueRequested: boolean;
  waitlisted: boolean;
  submittedAt: Date | null;
  decisionReason: string;
  decisionReleasedAt: Date | null;
};

function Row({ term, children }: { term: string; children: ReactNode }) {
  return (
    <div className="grid gap-1 py-2 sm:grid-cols-[12rem_1fr]">
      <dt className="font-medium text-ink-muted">{term}</dt>
      <dd className="min-w-0 break-words">{children}</dd>
    </div>
  );
}

function patternCredit(e: EntryFacts): string {
  if (e.patternSource === "original") return "Original design";
  const credit = [e.patternName || "Unnamed pattern", e.patternDesigner && `designed by ${e.patternDesigner}`].filter(Boolean).join(", ");
  return `From a pattern: ${credit}`;
}

export function EntryFactList({ entry: e, money, timeZone, juried }: { entry: EntryFacts; money: (cents: number) => string; timeZone: string; juried: boolean }) {
  return (
    <dl className="divide-y divide-line">
      <Row term="Category">{categoryText(e)}</Row>
      <Row term="Size">
        {formatSize(e.widthUm, e.lengthUm)}
        <span className="block text-sm text-ink-muted">
          Perimeter {formatInches(2 * (e.widthUm + e.lengthUm))}; typed in {e.sizeUnit === "cm" ? "centimetres" : "inches"}
        </span>
      </Row>
      <Row term="Division">
        {labelOf(DIVISION_LABELS, e.division)}
        {e.youthAge !== null ? ` (age ${e.youthAge})` : ""} · {e.judged ? "Judged" : "Display only"}
        {e.critiqueRequested ? " · Critique requested" : ""}
      </Row>
      <Row term="Techniques">{e.techniques.length ? e.techniques.join(", ") : "—"}</Row>
      <Row term="Made by">{e.madeBy.length ? e.madeBy.join(", ") : "—"}</Row>
      <Row term="Quilting">
        {labelOf(QUILTING_METHOD_LABELS, e.quiltingMethod)}
        {e.quiltedBy ? ` by ${e.quiltedBy}` : ""}
        {e.quiltedForHire ? " (quilted for hire)" : ""}
      </Row>
      <Row term="Pattern credit">{patternCredit(e)}</Row>
      <Row term="Statement">{e.statement ? <span className="whitespace-pre-line">{e.statement}</span> : "—"}</Row>
      <Row term="Declared value">{money(e.declaredValueCents)}</Row>
      <Row term="For sale">{e.forSale ? (e.priceCents !== null ? money(e.priceCents) : "Yes, no price given") : "Not for sale"}</Row>
      <Row term="Submitted">{formatDateTime(e.submittedAt, timeZone) ?? "—"}{e.waitlisted ? " · on the waiting list" : ""}</Row>
      {e.decisionReason ? <Row term="Reason given">{e.decisionReason}</Row> : null}
      {juried ? <Row term="Decision released">{formatDateTime(e.decisionReleasedAt, timeZone) ?? "Not yet"}</Row> : null}
    </dl>
  );
}
