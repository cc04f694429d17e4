// The public show for this request, looked up once for the layout, the metadata and the page.
import "server-only";
import { cache } from "react";
import { publicShowBySlug } from "@/db/queries/shows";
import { publicShowDetails } from "@/db/queries/settings";

export const publicShowFor = cache(publicShowBySlug);

/** The show with its fees, limits, photo rules and current rules text, for the page body. */
export const publicShowDetailsFor = cache(publicShowDetails);
