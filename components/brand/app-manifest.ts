// The web app manifest's common part: Ribbonry's name, colours and icons. The root manifest
// (app/manifest.ts) and each judging page's (app/api/shows/[slug]/judging/manifest) add where
// the installed app opens.
import type { MetadataRoute } from "next";

export function appManifest(opens: Pick<MetadataRoute.Manifest, "name" | "short_name" | "description" | "id" | "start_url">): MetadataRoute.Manifest {
  return {
    ...opens,
    scope: "/",
    display: "standalone",
    orientation: "any",
    background_color: "#fbf6ec",
    theme_color: "#5b2a86",
    icons: [
      { src: "/icons/ribbonry.svg", sizes: "any", type: "image/svg+xml", purpose: "any" },
      { src: "/icons/ribbonry-maskable.svg", sizes: "any", type: "image/svg+xml", purpose: "maskable" },
    ],
  };
}
