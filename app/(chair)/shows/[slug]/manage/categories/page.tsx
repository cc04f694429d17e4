// The chair's categories: the editor (with its live check and preview), the queue of entries the
// rules could not place, and the intake size tolerance. Locked once judging starts.
import type { Metadata } from "next";
import { CategoryEditor } from "@/components/categories/category-editor";
import { CategoryQueue } from "@/components/categories/category-queue";
import { ToleranceForm } from "@/components/categories/tolerance-form";
import { guardQuery, pageViewer } from "@/components/shell/guard";
import { Card, CardHeader } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { categoryEditor } from "@/db/queries/categories";
import { categoryQueue } from "@/db/queries/category-queue";

type Props = { params: Promise<{ slug: string }> };

export const metadata: Metadata = { title: "Categories" };

export default async function CategoriesPage({ params }: Props) {
  const { slug } = await params;
  const viewer = await pageViewer();
  const [editor, queue] = await Promise.all([guardQuery(categoryEditor(viewer, slug)), guardQuery(categoryQueue(viewer, slug))]);
  const open = queue.unplaced.length;
  return (
    <div className="space-y-8">
      <PageHeader
        eyebrow={editor.show.name}
        title="Categories"
        description="The rules that put each entry in its category, checked against the entries you have now."
        meta={
          <a href="#queue-title" className="inline-flex min-h-tap items-center font-semibold">
            {open ? `${open} ${open === 1 ? "entry needs" : "entries need"} a category` : "Every entry has its category"}
          </a>
        }
      />
      <CategoryEditor
        data={{
          showSlug: editor.show.slug,
          locked: editor.show.locked,
          overlap: editor.overlap,
          techniques: editor.techniques,
          categories: editor.categories,
          entries: editor.entries,
          starterSets: editor.starterSets,
        }}
      />
      <CategoryQueue showSlug={editor.show.slug} queue={queue} />
      <Card aria-labelledby="tolerance-title" className="max-w-3xl">
        <CardHeader id="tolerance-title" title="Size at intake" />
        <ToleranceForm showSlug={editor.show.slug} toleranceUm={editor.toleranceUm} />
      </Card>
    </div>
  );
}
