// Lets integration tests call server actions outside Next.js: next/headers answers with the
// headers the test set (its signed-in cookie), and revalidatePath is recorded instead of run.
import { vi } from "vitest";
import { requestContext } from "../helpers/request-context";

vi.mock("next/headers", () => ({
  headers: async () => requestContext.headers,
  cookies: async () => ({
    get: (name: string) => {
      const cookie = requestContext.headers.get("cookie") ?? "";
      const hit = cookie.split(/;\s*/).find((c) => c.startsWith(`${name}=`));
      return hit ? { name, value: hit.slice(name.length + 1) } : undefined;
    },
    getAll: () => [],
    set: () => {},
    delete: () => {},
    has: (name: string) => (requestContext.headers.get("cookie") ?? "").includes(`${name}=`),
  }),
}));

vi.mock("next/cache", () => ({
  revalidatePath: (path: string) => requestContext.revalidated.push(path),
  revalidateTag: (tag: string) => requestContext.revalidated.push(`tag:${tag}`),
}));
