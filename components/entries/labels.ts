// Words for the fixed choices on an entry (db/schema/entries.ts enums).
export const QUILTING_METHOD_LABELS: Record<string, string> = {
  hand: "Hand quilted",
  home_machine: "Quilted on a home machine",
  frame_machine: "Quilted on a frame machine",
};

export const DIVISION_LABELS: Record<string, string> = {
  open: "Open",
  youth: "Youth",
  first_time: "First-time entrant",
};

export const labelOf = (labels: Record<string, string>, key: string) => labels[key] ?? key.replace(/_/g, " ");
