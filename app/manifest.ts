// The web app manifest, so Ribbonry can be installed; a judging page links its own (opening there).
import type { MetadataRoute } from "next";
import { appManifest } from "@/components/brand/app-manifest";

export default function manifest(): MetadataRoute.Manifest {
  return appManifest({ name: "Ribbonry", short_name: "Ribbonry", description: "Quilt show entries, intake and blind judging.", id: "/", start_url: "/" });
}
