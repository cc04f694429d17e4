// The show's categories on its public page: code, name, the chair's description and the rule in
// plain words, so an entrant can see where a quilt belongs before entering it.
import type { Condition } from "@/scoring/categories";
import { ruleWords } from "@/components/categories/rule-words";

type Category = { id: string; code: string; name: string; description: string; conditions: Condition[] };

export function ShowCategories({ categories }: { categories: readonly Category[] }) {
  if (!categories.length) return <p className="text-ink-muted italic">The categories are still being set; check back before you enter.</p>;
  return (
    <ul className="divide-y divide-line">
      {categories.map((c) => (
        <li key={c.id} className="py-3 first:pt-0 last:pb-0">
          <p className="font-semibold">
            <span className="mr-2 inline-block min-w-10 rounded bg-plum-50 px-1.5 text-center font-mono text-sm text-plum-700">{c.code}</span>
            {c.name}
          </p>
          {c.description ? <p className="mt-1 text-ink-muted">{c.description}</p> : null}
          <p className="mt-1 text-sm text-ink-muted">{ruleWords(c.conditions)}</p>
        </li>
      ))}
    </ul>
  );
}
