// The viewer for this request, looked up once however many server components ask (shell + page).
import "server-only";
import { cache } from "react";
import { getViewer } from "@/lib/session";

export const currentViewer = cache(() => getViewer());
