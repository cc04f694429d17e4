"use client";
// A sign-in button that brings the person back to the page they were on.
import { usePathname } from "next/navigation";
import { ButtonLink, type ButtonVariant } from "@/components/ui/button";
import { LogIn } from "lucide-react";

export function SignInLink({ label = "Sign in", variant = "primary" }: { label?: string; variant?: ButtonVariant }) {
  const pathname = usePathname();
  const next = pathname && pathname !== "/" && !pathname.startsWith("/sign-") ? `?next=${encodeURIComponent(pathname)}` : "";
  return (
    <ButtonLink href={`/sign-in${next}`} variant={variant} icon={<LogIn aria-hidden className="size-5" />}>
      {label}
    </ButtonLink>
  );
}
