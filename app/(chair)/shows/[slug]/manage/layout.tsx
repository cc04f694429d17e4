// Checks the role before anything streams, so a refusal answers 401/403/404 rather than 200
// (see components/shell/guard.ts). The page checks again through its own query.
import type { ReactNode } from "react";
import { ManageTabs } from "@/components/chair/manage-tabs";
import { guardArea } from "@/components/shell/guard";
import { showIdBySlug } from "@/db/queries/shows";
import { settingsForShowId } from "@/db/queries/settings";

type Props = { children: ReactNode; params: Promise<{ slug: string }> };

export default async function AreaGuardLayout({ children, params }: Props) {
  const { slug } = await params;
  await guardArea(slug, "manage");
  const settings = await settingsForShowId(await showIdBySlug(slug));
  return (
    <>
      <ManageTabs slug={slug} juried={settings.juried} />
      {children}
    </>
  );
}
