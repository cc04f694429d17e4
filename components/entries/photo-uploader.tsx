"use client";
// One photo of an entry: the saved one (through the authorised photo route), a file picker, a
// progress bar while the file goes straight to storage, then the server's check. A refused file
// is explained beside the photo and the saved photo stays as it was.
import { useRef, useState } from "react";
import { ImageUp, LoaderCircle } from "lucide-react";
import { FieldError } from "@/components/ui/field";
import { buttonClasses } from "@/components/ui/button";
import { photoFormatTypeOf, photoFormatTypes, photoFormatWords } from "@/lib/photo-formats";
import type { EntryPhotoView } from "@/lib/schemas/entry";

type Saved = EntryPhotoView & { thumbUrl?: string };
type Phase = { kind: "idle" } | { kind: "uploading"; percent: number } | { kind: "checking" } | { kind: "error"; message: string } | { kind: "done" };

async function messageOf(res: Response): Promise<string> {
  const body = (await res.json().catch(() => null)) as { message?: string } | null;
  return body?.message ?? "The photo could not be saved. Please try again.";
}

class StorageRefused extends Error {}

/**
 * An S3 form POST: the signed fields first and the file last, because S3 ignores every field
 * after the file (AWS S3 API reference, POST Object). XMLHttpRequest rather than fetch for the
 * upload progress; either way the browser sends it to the storage origin (CSP connect-src).
 */
function post(url: string, fields: Record<string, string>, file: File, onProgress: (percent: number) => void): Promise<void> {
  const form = new FormData();
  for (const [name, value] of Object.entries(fields)) form.append(name, value);
  form.append("file", file);
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", url);
    xhr.upload.onprogress = (e) => e.lengthComputable && onProgress(Math.round((e.loaded / e.total) * 100));
    // 400/403 here is the signed policy refusing the file (too large, or another type).
    xhr.onload = () => (xhr.status >= 200 && xhr.status < 300 ? resolve() : reject(new StorageRefused(`upload answered ${xhr.status}`)));
    xhr.onerror = () => reject(new Error("network error"));
    xhr.send(form);
  });
}

export function PhotoUploader({ entryId, view, label, hint, saved: initial, disabled, maxBytes, formats }: { entryId: string; view: string; label: string; hint: string; saved: Saved | null; disabled?: boolean; maxBytes: number; formats: string[] }) {
  const formatWords = photoFormatWords(formats);
  const [saved, setSaved] = useState<Saved | null>(initial);
  const [phase, setPhase] = useState<Phase>({ kind: "idle" });
  const inputRef = useRef<HTMLInputElement>(null);
  const inputId = `photo-${view}`;
  const busy = phase.kind === "uploading" || phase.kind === "checking";

  async function upload(file: File) {
    const contentType = photoFormatTypeOf(file, formats);
    if (!contentType) return setPhase({ kind: "error", message: `This show takes ${formatWords} photos; choose one of those.` });
    if (file.size > maxBytes) return setPhase({ kind: "error", message: `The photo is ${(file.size / 1e6).toFixed(1)} MB; this show accepts up to ${Number((maxBytes / 1e6).toFixed(1))} MB.` });
    setPhase({ kind: "uploading", percent: 0 });
    try {
      const presign = await fetch(`/api/entries/${entryId}/photos`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ view, contentType, bytes: file.size }) });
      if (!presign.ok) return setPhase({ kind: "error", message: await messageOf(presign) });
      const { uploadUrl, uploadFields, uploadKey } = (await presign.json()) as { uploadUrl: string; uploadFields: Record<string, string>; uploadKey: string };
      await post(uploadUrl, uploadFields, file, (percent) => setPhase({ kind: "uploading", percent }));
      setPhase({ kind: "checking" });
      const attach = await fetch(`/api/entries/${entryId}/photos/${view}`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ uploadKey }) });
      if (!attach.ok) return setPhase({ kind: "error", message: await messageOf(attach) });
      setSaved((await attach.json()) as Saved);
      setPhase({ kind: "done" });
    } catch (err) {
      console.error("[photo-uploader] upload failed", err);
      if (err instanceof StorageRefused) {
        return setPhase({ kind: "error", message: `The photo store refused this file. Photos must be ${formatWords} files of at most ${Number((maxBytes / 1e6).toFixed(1))} MB.` });
      }
      setPhase({ kind: "error", message: "The upload didn't finish. Check your connection and try again; your saved photo is unchanged." });
    } finally {
      if (inputRef.current) inputRef.current.value = "";
    }
  }

  return (
    <section aria-labelledby={`${inputId}-title`} className="flex flex-col gap-3 rounded-card border border-line bg-surface p-4 sm:flex-row">
      <div className="flex aspect-square w-full shrink-0 items-center justify-center overflow-hidden rounded-control bg-paper-200 sm:w-40">
        {saved ? (
          // eslint-disable-next-line @next/next/no-img-element -- served by our authorised route, not a static asset
          <img src={saved.thumbUrl ?? `/api/photos/${saved.id}/thumb`} alt={`${label}, as saved`} className="size-full object-contain" />
        ) : (
          <span className="p-3 text-center text-sm text-ink-muted">No photo yet</span>
        )}
      </div>
      <div className="min-w-0 flex-1 space-y-2">
        <h3 id={`${inputId}-title`} className="text-lg">
          {label}
        </h3>
        <p className="text-sm text-ink-muted">{hint}</p>
        {saved ? <p className="text-sm tabular-nums">Saved: {saved.widthPx} × {saved.heightPx} px</p> : null}
        <input
          ref={inputRef}
          id={inputId}
          type="file"
          accept={photoFormatTypes(formats).join(",")}
          className="peer sr-only"
          disabled={disabled || busy}
          aria-describedby={phase.kind === "error" ? `${inputId}-error` : undefined}
          onChange={(e) => {
            const file = e.target.files?.[0];
            if (file) void upload(file);
          }}
        />
        {disabled ? null : (
          <label htmlFor={inputId} className={buttonClasses({ variant: saved ? "secondary" : "primary", className: `peer-focus-visible:outline-2 peer-focus-visible:outline-offset-2 peer-focus-visible:outline-brand ${busy ? "pointer-events-none opacity-60" : "cursor-pointer"}` })}>
            {busy ? <LoaderCircle aria-hidden className="size-5 animate-spin" /> : <ImageUp aria-hidden className="size-5" />}
            <span>{saved ? "Replace photo" : "Choose photo"}</span>
          </label>
        )}
        <div aria-live="polite">
          {phase.kind === "uploading" ? (
            <div className="space-y-1">
              <progress max={100} value={phase.percent} className="h-3 w-full accent-plum-600" aria-label={`Uploading ${label}`} />
              <p className="text-sm tabular-nums">Uploading… {phase.percent}%</p>
            </div>
          ) : null}
          {phase.kind === "checking" ? <p className="text-sm">Checking the photo…</p> : null}
          {phase.kind === "done" ? <p className="text-sm font-medium text-success-700">Photo saved.</p> : null}
        </div>
        <FieldError id={`${inputId}-error`} message={phase.kind === "error" ? phase.message : undefined} />
        {phase.kind === "error" && saved ? <p className="text-sm text-ink-muted">Your saved photo is unchanged.</p> : null}
      </div>
    </section>
  );
}
