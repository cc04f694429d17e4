"use client";
// Registers the service worker (app/sw.ts, built by `serwist build` into public/sw.js) from the
// judging area only, so the judging page, its session and photos open without a network. Once
// the worker controls the page, the page fetches itself once so the worker keeps a copy (the
// first load came before the worker). Off in development, where there is no built worker.
import { useEffect } from "react";

export function RegisterWorker() {
  useEffect(() => {
    if (process.env.NODE_ENV !== "production" || !("serviceWorker" in navigator)) return;
    const sw = navigator.serviceWorker;
    const keepPage = () => void fetch(location.pathname, { headers: { accept: "text/html" }, credentials: "same-origin" }).catch(() => {});
    sw.register("/sw.js", { scope: "/" })
      .then(() => (sw.controller ? keepPage() : sw.addEventListener("controllerchange", keepPage, { once: true })))
      .catch((err) => console.error("judging: the offline worker did not register", err));
  }, []);
  return null;
}
