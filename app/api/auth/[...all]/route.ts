// better-auth's endpoints (sign-up, sign-in, verification, password reset, sessions, admin),
// entered through handleAuthRequest so rate limits key on the real client address.
import { toNextJsHandler } from "better-auth/next-js";
import { handleAuthRequest } from "@/lib/auth";

export const { GET, POST } = toNextJsHandler(handleAuthRequest);
