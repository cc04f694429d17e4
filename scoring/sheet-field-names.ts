// A score-sheet field key ("mark:applique", "comment:overall") in the sheet's own words, for the
// chair's sheet history. Pure: takes the sheet the key belongs to.
import type { ScoreSheet } from "./score-sheets";

export function sheetFieldName(field: string | null, sheet: ScoreSheet | null): string {
  if (!field) return "—";
  const [kind, id = ""] = field.split(/:(.*)/s);
  const sections = sheet?.sections ?? [];
  if (kind === "mark") {
    const criterion = sections.flatMap((s) => s.criteria).find((c) => c.id === id);
    return `Mark for ${criterion?.label ?? id.replace(/[_-]/g, " ")}`;
  }
  if (kind === "comment") {
    if (id === "overall") return "Overall comment";
    const section = sections.find((s) => s.id === id);
    return `Comment on ${section?.title ?? id.replace(/[_-]/g, " ")}`;
  }
  return field.replace(/[_:]/g, " ");
}
