// A live word count under the artist statement; the server counts the same way (countWords).
import { countWords } from "@/scoring/entry-completeness";

export function WordCount({ text, limit, id }: { text: string; limit: number; id?: string }) {
  const words = countWords(text);
  const over = words > limit;
  return (
    <p id={id} aria-live="polite" className={over ? "text-sm font-semibold text-danger-700" : "text-sm text-ink-muted"}>
      {words} of {limit} words{over ? ` — ${words - limit} over the limit` : ""}
    </p>
  );
}
