// The judging queue for judges and scribes: entry numbers and quilt facts only, never makers.
import { judgingQueue } from "@/db/queries/judging";
import { defineRoute } from "@/lib/api";

export const GET = defineRoute<{ slug: string }>({ access: "user" }, async ({ viewer, params }) =>
  judgingQueue(viewer!, params.slug),
);
