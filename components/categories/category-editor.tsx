"use client";
// The chair's category editor: a draft of the whole set (list, one category's form, set tools),
// checked and previewed against the show's current entries on every change, saved in one go.
import { useCallback, useMemo, useState } from "react";
import { Lock, Plus } from "lucide-react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Card, CardHeader } from "@/components/ui/card";
import type { FieldErrors } from "@/lib/errors";
import type { CategoryRule, OverlapMode } from "@/scoring/categories";
import { mergeInto, splitBySize, type EntryInSet, type ShowCategory } from "@/scoring/category-sets";
import { CategoryForm } from "./category-form";
import { CategoryList, type RowAction } from "./category-list";
import { blankCategory, categoryToForm, type CategoryForm as FormValues } from "./form-model";
import { previewDraft } from "./preview";
import { SavePanel } from "./save-panel";
import { RulePreview, SetCheck } from "./set-check";
import { DeleteConfirm, MergeForm, OverlapChoice, SplitForm, StarterPicker, type SplitAt } from "./set-tools";
import { sameSet } from "./stable-key";

export type EditorData = {
  showSlug: string;
  locked: boolean;
  overlap: OverlapMode;
  techniques: string[];
  categories: (ShowCategory & { entryCount: number; waitingCount: number })[];
  entries: EntryInSet[];
  starterSets: { key: string; name: string; description: string; overlap: OverlapMode; rules: CategoryRule[] }[];
};

type Editing = { id: string; isNew: boolean; initial: FormValues };
type Tool = { kind: "split" | "merge" | "delete"; id: string };

const plain = (cs: EditorData["categories"]): ShowCategory[] =>
  cs.map(({ entryCount: _e, waitingCount: _w, ...c }) => ({ ...c, description: c.description || undefined, cap: c.cap ?? null, mergedIntoId: c.mergedIntoId ?? null }));

export function CategoryEditor({ data }: { data: EditorData }) {
  const [baseline, setBaseline] = useState(() => ({ set: plain(data.categories), overlap: data.overlap }));
  const [draft, setDraft] = useState<ShowCategory[]>(baseline.set);
  const [overlap, setOverlap] = useState<OverlapMode>(data.overlap);
  const [editing, setEditing] = useState<Editing | null>(null);
  const [live, setLive] = useState<ShowCategory | null>(null);
  const [tool, setTool] = useState<Tool | null>(null);
  const [serverErrors, setServerErrors] = useState<FieldErrors>({});
  const readOnly = data.locked;

  const counts = useMemo(() => new Map(data.categories.map((c) => [c.id, { entries: c.entryCount, waiting: c.waitingCount }])), [data.categories]);
  const preview = useMemo(() => previewDraft(draft, data.entries, overlap, editing ? live : null), [draft, data.entries, overlap, editing, live]);
  const savedPreview = useMemo(() => (editing ? previewDraft(draft, data.entries, overlap, null) : preview), [editing, draft, data.entries, overlap, preview]);
  const dirty = !sameSet(draft, baseline.set) || overlap !== baseline.overlap;

  // Server messages by category (paths inside it), and the ones that name no category.
  const { byCategory, general } = useMemo(() => {
    const byCategory = new Map<string, Record<string, string>>();
    const general: string[] = [];
    for (const [key, messages] of Object.entries(serverErrors)) {
      const m = /^categories\.(\d+)\.(.+)$/.exec(key);
      const c = m ? draft[Number(m[1])] : undefined;
      if (c && m) byCategory.set(c.id, { ...byCategory.get(c.id), [m[2]!]: messages[0] ?? "" });
      else general.push(...messages);
    }
    return { byCategory, general };
  }, [serverErrors, draft]);

  const onLive = useCallback((rule: ShowCategory) => setLive(rule), []);
  const find = (id: string) => draft.find((c) => c.id === id);
  const codesExcept = (id: string | null) => draft.filter((c) => c.id !== id).map((c) => c.code);

  function startEdit(c: ShowCategory) {
    setTool(null);
    setEditing({ id: c.id, isNew: false, initial: categoryToForm(c) });
    setLive(c);
  }
  function startNew() {
    const id = crypto.randomUUID();
    const precedence = draft.reduce((m, c) => Math.max(m, c.precedence), 0) + 10;
    setTool(null);
    setEditing({ id, isNew: true, initial: blankCategory(id, precedence) });
    setLive(null);
  }
  function closeEdit() {
    setEditing(null);
    setLive(null);
  }
  function done(rule: ShowCategory) {
    setDraft((d) => (d.some((c) => c.id === rule.id) ? d.map((c) => (c.id === rule.id ? rule : c)) : [...d, rule]));
    setServerErrors((e) => Object.fromEntries(Object.entries(e).filter(([k]) => !k.startsWith("categories."))));
    closeEdit();
  }
  function onAction(action: RowAction, id: string) {
    const c = find(id);
    if (!c) return;
    if (action === "edit") return startEdit(c);
    if (action === "unmerge") return setDraft((d) => d.map((x) => (x.id === id ? { ...x, mergedIntoId: null } : x)));
    closeEdit();
    setTool({ kind: action, id });
  }
  function loadStarter(key: string) {
    const s = data.starterSets.find((x) => x.key === key);
    if (!s) return;
    // Starter rules carry readable ids ("pieced-small"); each show's categories get fresh ones.
    const ids = new Map(s.rules.map((r) => [r.id, crypto.randomUUID()]));
    setDraft(s.rules.map((r) => ({ ...r, id: ids.get(r.id)!, cap: null, mergedIntoId: null })));
    setOverlap(s.overlap);
    closeEdit();
    setTool(null);
  }
  function split(id: string, at: SplitAt, code: string, name: string) {
    setDraft((d) => splitBySize(d, id, at, { id: crypto.randomUUID(), code, name }));
    setTool(null);
  }
  function merge(id: string, into: string) {
    setDraft((d) => mergeInto(d, id, into));
    setTool(null);
  }
  function remove(id: string) {
    setDraft((d) => d.filter((c) => c.id !== id).map((c) => (c.mergedIntoId === id ? { ...c, mergedIntoId: null } : c)));
    setTool(null);
  }
  function discard() {
    setDraft(baseline.set);
    setOverlap(baseline.overlap);
    setServerErrors({});
    closeEdit();
    setTool(null);
  }

  const toolCategory = tool ? find(tool.id) : undefined;
  const editingId = editing?.id ?? null;
  const otherCodes = useMemo(() => draft.filter((c) => c.id !== editingId).map((c) => c.code), [draft, editingId]);
  const editingName = live?.name ?? editing?.initial.name ?? "";

  return (
    <div className="grid min-w-0 gap-6 lg:grid-cols-[minmax(0,1fr)_24rem]">
      <div className="min-w-0 space-y-6">
        {readOnly ? (
          <Alert tone="info" title="Judging has started, so the categories are locked.">
            Entries stay where they are while the judges work. The list below is for reading only.
          </Alert>
        ) : null}
        <Card aria-labelledby="categories-title">
          <CardHeader
            id="categories-title"
            title="Categories"
            description={`${draft.filter((c) => !c.mergedIntoId).length} in use${draft.some((c) => c.mergedIntoId) ? `, ${draft.filter((c) => c.mergedIntoId).length} merged` : ""}. An entry goes to the category whose conditions it meets.`}
            actions={readOnly ? <Lock aria-label="Locked" className="size-6 text-ink-muted" /> : (
              <Button onClick={startNew} disabled={Boolean(editing)} icon={<Plus aria-hidden className="size-5" />}>
                Add a category
              </Button>
            )}
          />
          <div className="space-y-5">
            {byCategory.size || general.length ? (
              <Alert live tone="error" title="Some categories need attention before they can be saved.">
                <ul className="list-disc space-y-1 pl-5">
                  {[...byCategory].map(([id, errs]) => {
                    const c = find(id);
                    return (
                      <li key={id}>
                        {c ? `${c.code} ${c.name}` : "A category"}: {Object.values(errs).join(" ")}{" "}
                        {c && !editing ? <button type="button" className="font-semibold underline" onClick={() => startEdit(c)}>Edit it</button> : null}
                      </li>
                    );
                  })}
                  {general.map((m) => <li key={m}>{m}</li>)}
                </ul>
              </Alert>
            ) : null}
            {editing ? (
              <div className="rounded-card border-2 border-plum-300 bg-surface p-3 sm:p-5">
                <CategoryForm
                  key={editing.id}
                  initial={editing.initial}
                  isNew={editing.isNew}
                  otherCodes={otherCodes}
                  techniques={data.techniques}
                  serverErrors={byCategory.get(editing.id)}
                  preview={<RulePreview takes={preview.takes} name={editingName} check={preview.check} />}
                  onLive={onLive}
                  onDone={done}
                  onCancel={closeEdit}
                />
              </div>
            ) : null}
            {tool && toolCategory ? (
              <div className="rounded-card border-2 border-plum-300 bg-surface p-3 sm:p-5">
                {tool.kind === "split" ? <SplitForm category={toolCategory} takenCodes={codesExcept(null)} onSplit={(at, code, name) => split(tool.id, at, code, name)} onCancel={() => setTool(null)} /> : null}
                {tool.kind === "merge" ? <MergeForm category={toolCategory} targets={draft.filter((c) => c.id !== tool.id && !c.mergedIntoId)} onMerge={(into) => merge(tool.id, into)} onCancel={() => setTool(null)} /> : null}
                {tool.kind === "delete" ? <DeleteConfirm category={toolCategory} entryCount={counts.get(tool.id)?.entries ?? 0} mergedHere={draft.filter((c) => c.mergedIntoId === tool.id).length} onDelete={() => remove(tool.id)} onCancel={() => setTool(null)} /> : null}
              </div>
            ) : null}
            {draft.length ? (
              <CategoryList set={draft} counts={counts} readOnly={readOnly} selectedId={editing?.id ?? tool?.id ?? null} onAction={onAction} />
            ) : (
              <p className="text-ink-muted">No categories yet. Add one, or load a starter set and change it to suit the show.</p>
            )}
          </div>
        </Card>
        {readOnly ? null : (
          <Card aria-labelledby="set-options">
            <CardHeader id="set-options" title="Starting point and overlaps" />
            <div className="grid gap-6">
              <StarterPicker starters={data.starterSets} count={draft.length} disabled={Boolean(editing)} onLoad={loadStarter} />
              <OverlapChoice value={overlap} disabled={false} onChange={setOverlap} />
            </div>
          </Card>
        )}
      </div>
      <aside className="min-w-0 space-y-6 lg:sticky lg:top-4 lg:self-start" aria-label="Check and save">
        <Card>
          <SetCheck preview={preview} editing={Boolean(editing)} />
        </Card>
        {readOnly ? null : (
          <Card>
            <SavePanel
              showSlug={data.showSlug}
              set={draft}
              overlap={overlap}
              dirty={dirty}
              blocked={editing ? "Finish the category you are editing first (Done or Cancel)." : tool ? "Finish or cancel the split, merge or delete first." : null}
              expectedMoves={savedPreview.moves.length}
              onSaved={() => setBaseline({ set: draft, overlap })}
              onFieldErrors={setServerErrors}
              onDiscard={discard}
            />
          </Card>
        )}
      </aside>
    </div>
  );
}
