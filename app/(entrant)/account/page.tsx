// Account: the entrant profile (name for entries, contact details, consent) and the person's
// roles at each show.
import type { Metadata } from "next";
import Link from "next/link";
import { ProfileForm } from "@/components/account/profile-form";
import { guardQuery, pageViewer } from "@/components/shell/guard";
import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { Card, CardHeader } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { profileFor } from "@/db/queries/profiles";
import { ROLE_LABELS } from "@/lib/schemas/show";
import type { Viewer } from "@/lib/session";

export const metadata: Metadata = { title: "Account" };

function rolesByShow(viewer: Viewer) {
  const shows = new Map<string, { name: string; roles: string[] }>();
  for (const r of viewer.roles) {
    const s = shows.get(r.showSlug) ?? { name: r.showName, roles: [] };
    s.roles.push(ROLE_LABELS[r.role]);
    shows.set(r.showSlug, s);
  }
  return [...shows.entries()].sort((a, b) => a[1].name.localeCompare(b[1].name));
}

export default async function AccountPage() {
  const viewer = await pageViewer();
  const profile = await guardQuery(profileFor(viewer));
  const roles = rolesByShow(viewer);

  return (
    <div className="space-y-8">
      <PageHeader title="Account" description={`Signed in as ${viewer.name} (${viewer.email}).`} />
      <div className="grid gap-6 lg:grid-cols-[1fr_20rem]">
        <Card aria-labelledby="profile">
          <CardHeader id="profile" title="Your details for entries" />
          <div className="space-y-6">
            <Alert tone="warning" title="How shows use these details">
              The show committee uses your address and phone only to reach you about your entries — drop-off, pick-up
              and returning quilts. Your name is published beside your quilt and in results only if you tick the box
              below.
            </Alert>
            <ProfileForm profile={profile} />
          </div>
        </Card>
        <Card aria-labelledby="roles" className="h-fit">
          <CardHeader id="roles" title="Your roles" />
          {roles.length ? (
            <ul className="space-y-4">
              {roles.map(([slug, s]) => (
                <li key={slug}>
                  <p className="font-semibold">{s.name}</p>
                  <p className="mt-1 flex flex-wrap gap-2">
                    {s.roles.map((r) => (
                      <Badge key={r} tone="brand">
                        {r}
                      </Badge>
                    ))}
                  </p>
                </li>
              ))}
            </ul>
          ) : (
            <p className="text-ink-muted">
              You have no team role at any show. Show chairs invite judges, scribes and intake volunteers by e-mail.
            </p>
          )}
          {viewer.isAdmin ? (
            <p className="mt-4 border-t border-line pt-4">
              You are a platform administrator. <Link href="/admin">Go to admin</Link>.
            </p>
          ) : null}
        </Card>
      </div>
    </div>
  );
}
