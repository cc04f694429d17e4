// An entry's category for the committee's screens and files: the code with the category's name,
// or in plain words why there is none yet. Pure and low, so the chair's table, the entry page and
// the spreadsheet say the same.
export type CategoryOfEntry = { categoryState: string; categoryCode: string | null; categoryName: string | null };

export function categoryText(e: CategoryOfEntry): string {
  if (e.categoryCode) return `${e.categoryCode} ${e.categoryName ?? ""}`.trim();
  if (e.categoryState === "fits_none") return "Fits no category: chair to place";
  if (e.categoryState === "fits_several") return "Fits several: chair to place";
  return "Not decided yet";
}
