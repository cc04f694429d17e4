// Where a sheet's changes are, in words: on this tablet only, on the server, in conflict, or
// refused by the server. Colour is the third signal after the word and the icon.
import { CircleAlert, CircleCheck, CloudUpload, Split } from "lucide-react";
import { Badge, type BadgeTone } from "@/components/ui/badge";
import type { SyncState } from "./outbox";

const LOOK: Record<SyncState, { tone: BadgeTone; icon: typeof CircleCheck; text: string }> = {
  synced: { tone: "success", icon: CircleCheck, text: "Synced" },
  saved: { tone: "info", icon: CloudUpload, text: "Saved on this tablet" },
  conflict: { tone: "warning", icon: Split, text: "Conflict" },
  refused: { tone: "danger", icon: CircleAlert, text: "Not accepted" },
};

export function SyncBadge({ state, className }: { state: SyncState; className?: string }) {
  const look = LOOK[state];
  return (
    <Badge tone={look.tone} icon={look.icon} className={className}>
      {look.text}
    </Badge>
  );
}
