// An entry's status in plain words: a badge (word + icon + colour) and a one-line explanation.
import {
  Ban,
  Banknote,
  CircleCheck,
  CircleSlash,
  Frame,
  Gavel,
  Hourglass,
  ListOrdered,
  PackageCheck,
  PencilLine,
  Undo2,
  type LucideIcon,
} from "lucide-react";
import { Badge, type BadgeTone } from "@/components/ui/badge";

type StatusInfo = {
  label: string;
  tone: BadgeTone;
  icon: LucideIcon;
  explain: string;
  /** What the entrant still has to do, when anything. */
  missing?: string;
};

export const ENTRY_STATUS: Record<string, StatusInfo> = {
  draft: { label: "Draft", tone: "neutral", icon: PencilLine, explain: "Not sent yet: the show cannot see it.", missing: "Finish the form and send it to the show." },
  submitted: { label: "Submitted", tone: "info", icon: Hourglass, explain: "Received by the show, with its entry number.", missing: "Pay the entry fee to confirm the entry." },
  waitlisted: { label: "Waiting list", tone: "warning", icon: ListOrdered, explain: "The show is full for now. You will hear from the show if a place opens; nothing to pay yet." },
  paid: { label: "Paid", tone: "info", icon: Banknote, explain: "Entry fee paid. The committee will review the entry." },
  accepted: { label: "Accepted", tone: "success", icon: CircleCheck, explain: "Accepted into the show. Bring the quilt to drop-off." },
  declined: { label: "Declined", tone: "danger", icon: Ban, explain: "The committee could not accept this entry." },
  received: { label: "Received", tone: "success", icon: PackageCheck, explain: "Checked in at drop-off. The show has your quilt." },
  judged: { label: "Judged", tone: "brand", icon: Gavel, explain: "The judges have seen your quilt. Results come when the chair publishes them." },
  hung: { label: "Hung", tone: "gold", icon: Frame, explain: "Hanging in the show for visitors to see." },
  returned: { label: "Returned", tone: "neutral", icon: Undo2, explain: "Handed back to you or your named collector at pick-up." },
  withdrawn: { label: "Withdrawn", tone: "neutral", icon: CircleSlash, explain: "Taken out of the show. Its entry number stays with it and is not given to anyone else." },
};

const UNKNOWN: StatusInfo = { label: "Unknown", tone: "neutral", icon: Hourglass, explain: "" };

export function entryStatusInfo(status: string): StatusInfo {
  return ENTRY_STATUS[status] ?? { ...UNKNOWN, label: status };
}

export function EntryStatusBadge({ status }: { status: string }) {
  const s = entryStatusInfo(status);
  return (
    <Badge tone={s.tone} icon={s.icon}>
      {s.label}
    </Badge>
  );
}
