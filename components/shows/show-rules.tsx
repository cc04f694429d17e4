// The current rules and release text on a show's public page, with its version number.
import { ScrollText } from "lucide-react";
import { formatDate, isoDateTime } from "@/components/format/dates";

type Rules = { version: number; rulesText: string; releaseText: string; publishedAt: Date } | null;

export function ShowRules({ rules, timeZone }: { rules: Rules; timeZone: string }) {
  if (!rules) return <p className="text-ink-muted italic">The committee hasn’t published the rules yet.</p>;
  return (
    <div className="space-y-4">
      {/* Plain text with the icon inline, so the line wraps as words on a phone (a flex row would squeeze each piece into its own column). */}
      <p className="text-sm text-ink-muted">
        <ScrollText aria-hidden className="mr-2 inline size-4 align-[-0.125em]" />
        Version {rules.version}, published <time dateTime={isoDateTime(rules.publishedAt)}>{formatDate(rules.publishedAt, timeZone)}</time>. You accept
        this version when you enter.
      </p>
      <section aria-labelledby="rules-text" className="space-y-2">
        <h3 id="rules-text" className="text-lg">
          Rules
        </h3>
        <div className="max-w-prose whitespace-pre-line">{rules.rulesText}</div>
      </section>
      <section aria-labelledby="release-text" className="space-y-2">
        <h3 id="release-text" className="text-lg">
          Release
        </h3>
        <div className="max-w-prose whitespace-pre-line">{rules.releaseText}</div>
      </section>
    </div>
  );
}
