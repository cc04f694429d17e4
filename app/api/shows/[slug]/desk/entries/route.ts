// The intake desk's entry list (intake volunteers and the chair).
import { intakeList } from "@/db/queries/desk";
import { defineRoute } from "@/lib/api";

export const GET = defineRoute<{ slug: string }>({ access: "user" }, async ({ viewer, params }) =>
  intakeList(viewer!, params.slug),
);
