// The signed-in viewer and their roles per show.
import { defineRoute } from "@/lib/api";

export const GET = defineRoute({ access: "user" }, async ({ viewer }) => viewer);
