// The public show for this request, looked up once for the layout, the metadata and the page.
import "server-only";
import { cache } from "react";
import { publicShowBySlug } from "@/db/queries/shows";

export const publicShowFor = cache(publicShowBySlug);
