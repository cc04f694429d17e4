// A form's last row: its submit button (showing progress while the action runs) and, when the
// form can be closed, Cancel beside it.
import type { ReactNode } from "react";
import { X } from "lucide-react";
import { Button, type ButtonVariant } from "@/components/ui/button";

type Props = { children: ReactNode; pending?: boolean; pendingLabel?: string; variant?: ButtonVariant; icon?: ReactNode; onCancel?: () => void };

export function SubmitOrCancel({ children, pending, pendingLabel, variant, icon, onCancel }: Props) {
  return (
    <div className="flex flex-wrap gap-3">
      <Button type="submit" variant={variant} pending={pending} pendingLabel={pendingLabel} icon={icon}>
        {children}
      </Button>
      {onCancel ? (
        <Button variant="ghost" onClick={onCancel} icon={<X aria-hidden className="size-5" />}>
          Cancel
        </Button>
      ) : null}
    </div>
  );
}
