"use client";
// The draft set as a list: order, code, name, what it takes, entries against its cap and the
// waiting count; merged categories say where their entries went. The buttons under each name
// start an edit (beside the name, not in a column of their own, so the rule keeps its width).
import { GitMerge, Pencil, Scissors, Trash2, Undo2 } from "lucide-react";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import type { ShowCategory } from "@/scoring/category-sets";
import { ruleWords } from "./rule-words";

export type RowAction = "edit" | "split" | "merge" | "delete" | "unmerge";
type Counts = ReadonlyMap<string, { entries: number; waiting: number }>;

const order = (a: ShowCategory, b: ShowCategory) => a.precedence - b.precedence || a.code.localeCompare(b.code, "en", { numeric: true });

export function CategoryList({ set, counts, readOnly, selectedId, onAction }: { set: readonly ShowCategory[]; counts: Counts; readOnly: boolean; selectedId: string | null; onAction: (action: RowAction, id: string) => void }) {
  const byId = new Map(set.map((c) => [c.id, c]));
  const rows = [...set].sort(order);
  return (
    <Table caption="Categories in precedence order">
      <THead>
        <tr role="row">
          <Th>Order</Th>
          <Th>Category</Th>
          <Th>Entries</Th>
          <Th>Waiting</Th>
        </tr>
      </THead>
      <TBody>
        {rows.map((c) => {
          const n = counts.get(c.id) ?? { entries: 0, waiting: 0 };
          const into = c.mergedIntoId ? byId.get(c.mergedIntoId) : undefined;
          const label = `${c.code} ${c.name}`;
          return (
            <Tr key={c.id} aria-current={selectedId === c.id ? "true" : undefined} className="aria-[current=true]:bg-plum-50">
              <Td label="Order">{c.precedence}</Td>
              <Td label="Category" primary>
                <span className="font-semibold">
                  <span className="tabular-nums">{c.code}</span> {c.name}
                </span>
                {into ? (
                  <Badge tone="info" icon={GitMerge} className="ml-2 whitespace-normal">
                    merged into {into.code} {into.name}
                  </Badge>
                ) : null}
                <span className="block text-sm font-normal break-words text-ink-muted">{ruleWords(c.conditions)}</span>
                {readOnly ? null : (
                  <div className="mt-2 -ml-2 flex flex-wrap gap-x-1 text-base font-normal">
                    <Button variant="ghost" className="px-2!" onClick={() => onAction("edit", c.id)} icon={<Pencil aria-hidden className="size-4" />} aria-label={`Edit ${label}`}>
                      Edit
                    </Button>
                    {into ? (
                      <Button variant="ghost" className="px-2!" onClick={() => onAction("unmerge", c.id)} icon={<Undo2 aria-hidden className="size-4" />} aria-label={`Undo the merge of ${label}`}>
                        Unmerge
                      </Button>
                    ) : (
                      <>
                        <Button variant="ghost" className="px-2!" onClick={() => onAction("split", c.id)} icon={<Scissors aria-hidden className="size-4" />} aria-label={`Split ${label} at a size`}>
                          Split
                        </Button>
                        <Button variant="ghost" className="px-2!" onClick={() => onAction("merge", c.id)} icon={<GitMerge aria-hidden className="size-4" />} aria-label={`Merge ${label} into another`}>
                          Merge
                        </Button>
                      </>
                    )}
                    <Button variant="ghost" className="px-2!" onClick={() => onAction("delete", c.id)} icon={<Trash2 aria-hidden className="size-4" />} aria-label={`Delete ${label}`}>
                      Delete
                    </Button>
                  </div>
                )}
              </Td>
              <Td label="Entries">
                <span className="tabular-nums">
                  {n.entries}
                  {c.cap ? ` / ${c.cap}` : ""}
                </span>
                {c.cap && n.entries >= c.cap ? <Badge tone="warning" className="ml-2">full</Badge> : null}
              </Td>
              <Td label="Waiting">
                <span className="tabular-nums">{n.waiting}</span>
              </Td>
            </Tr>
          );
        })}
      </TBody>
    </Table>
  );
}
