// Icons for navigation links, chosen by name because the server sends the links as plain data.
import {
  ClipboardCheck,
  ClipboardPen,
  Inbox,
  LogIn,
  Settings2,
  Shield,
  Store,
  UserPlus,
  UserRound,
  type LucideIcon,
} from "lucide-react";
import type { NavIcon as NavIconName } from "./nav-types";

const ICONS: Record<NavIconName, LucideIcon> = {
  entries: Inbox,
  account: UserRound,
  admin: Shield,
  manage: Settings2,
  judging: ClipboardPen,
  desk: ClipboardCheck,
  show: Store,
  signIn: LogIn,
  signUp: UserPlus,
};

export function NavIcon({ name, className }: { name: NavIconName; className?: string }) {
  const Icon = ICONS[name];
  return <Icon aria-hidden className={className ?? "size-5 shrink-0"} />;
}

/** Is this link the current page (or, for area links, a page inside it)? */
export function isActive(pathname: string, href: string, exact = false): boolean {
  if (exact || href === "/") return pathname === href;
  return pathname === href || pathname.startsWith(`${href}/`);
}
