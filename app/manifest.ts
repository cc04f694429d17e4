// The web app manifest, so a judging tablet can install Ribbonry and open it from the home screen.
import type { MetadataRoute } from "next";

export default function manifest(): MetadataRoute.Manifest {
  return {
    name: "Ribbonry",
    short_name: "Ribbonry",
    description: "Quilt show entries, intake and blind judging.",
    id: "/",
    start_url: "/",
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
