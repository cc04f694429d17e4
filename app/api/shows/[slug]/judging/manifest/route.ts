// The judging screen's own web app manifest, so a tablet that installs Ribbonry from a show's
// judging page opens straight on that page (which the service worker keeps) without a network.
// Public like the root manifest: it names only the show's address.
import { NextResponse } from "next/server";
import { defineRoute } from "@/lib/api";

export const GET = defineRoute<{ slug: string }>({ access: "public" }, async ({ params }) => {
  const start = `/shows/${encodeURIComponent(params.slug)}/judging`;
  return NextResponse.json(
    {
      name: "Ribbonry judging",
      short_name: "Judging",
      description: "Blind judging on a tablet, with or without Wi-Fi.",
      id: start,
      start_url: start,
      scope: "/",
      display: "standalone",
      orientation: "any",
      background_color: "#fbf6ec",
      theme_color: "#5b2a86",
      icons: [
        { src: "/icons/ribbonry.svg", sizes: "any", type: "image/svg+xml", purpose: "any" },
        { src: "/icons/ribbonry-maskable.svg", sizes: "any", type: "image/svg+xml", purpose: "maskable" },
      ],
    },
    { headers: { "content-type": "application/manifest+json" } },
  );
});
