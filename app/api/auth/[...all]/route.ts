// better-auth's endpoints (sign-up, sign-in, verification, password reset, sessions, admin).
import { toNextJsHandler } from "better-auth/next-js";
import { auth } from "@/lib/auth";

export const { GET, POST } = toNextJsHandler(auth);
