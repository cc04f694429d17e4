// The judging screen's own web app manifest, so a tablet that installs Ribbonry from a show's
// judging page opens straight on that page (which the service worker keeps) without a network.
// Public like the root manifest: it names only the show's address.
import { NextResponse } from "next/server";
import { appManifest } from "@/components/brand/app-manifest";
import { defineRoute } from "@/lib/api";
import { notFound } from "@/lib/errors";
import { hasUnstorableChar } from "@/lib/validation";

export const GET = defineRoute<{ slug: string }>({ access: "public" }, async ({ params }) => {
  // No show's address holds half a surrogate pair, and encodeURIComponent throws on one.
  if (hasUnstorableChar(params.slug)) throw notFound("There is no show at this address.");
  const start = `/shows/${encodeURIComponent(params.slug)}/judging`;
  const manifest = appManifest({ name: "Ribbonry judging", short_name: "Judging", description: "Blind judging on a tablet, with or without Wi-Fi.", id: start, start_url: start });
  return NextResponse.json(manifest, { headers: { "content-type": "application/manifest+json" } });
});
