// A show's stage in plain words, with an icon and colour.
import { Archive, CalendarClock, DoorClosed, ClipboardPen, PencilRuler, Trophy, type LucideIcon } from "lucide-react";
import { Badge, type BadgeTone } from "@/components/ui/badge";

const STATUS: Record<string, { label: string; tone: BadgeTone; icon: LucideIcon }> = {
  draft: { label: "Being set up", tone: "neutral", icon: PencilRuler },
  entries_open: { label: "Taking entries", tone: "success", icon: CalendarClock },
  entries_closed: { label: "Entries closed", tone: "warning", icon: DoorClosed },
  judging: { label: "Judging under way", tone: "brand", icon: ClipboardPen },
  results_published: { label: "Results out", tone: "gold", icon: Trophy },
  archived: { label: "Finished", tone: "neutral", icon: Archive },
};

export function showStatusLabel(status: string): string {
  return STATUS[status]?.label ?? status;
}

export function ShowStatusBadge({ status }: { status: string }) {
  const s = STATUS[status] ?? { label: status, tone: "neutral" as const, icon: CalendarClock };
  return (
    <Badge tone={s.tone} icon={s.icon}>
      {s.label}
    </Badge>
  );
}
