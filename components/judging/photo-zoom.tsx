"use client";
// A quilt photo that pinches, drags and double-taps to zoom. Written by hand on pointer events
// (two pointers: pinch; one: pan when zoomed) with `touch-action: none` on the frame, because the
// judging screen needs only this and no gesture library is in the stack.
import { useEffect, useRef, useState, type PointerEvent } from "react";
import { Minus, Plus, RotateCcw } from "lucide-react";
import { localDb } from "./local-db";

type View = { scale: number; x: number; y: number };
const MAX = 6;
const clampScale = (s: number) => Math.min(MAX, Math.max(1, s));

/** The stored blob's URL when this tablet holds the photo, else the network URL. */
function usePhotoSrc(photoId: string, networkUrl: string) {
  const [src, setSrc] = useState<string | null>(null);
  useEffect(() => {
    let url: string | null = null;
    let gone = false;
    void localDb()
      .photos.get(photoId)
      .then((p) => {
        if (gone) return;
        if (p) {
          url = URL.createObjectURL(p.blob);
          setSrc(url);
        } else setSrc(networkUrl);
      })
      .catch(() => !gone && setSrc(networkUrl));
    return () => {
      gone = true;
      if (url) URL.revokeObjectURL(url);
    };
  }, [photoId, networkUrl]);
  return src;
}

export function PhotoZoom({ photoId, url, alt, widthPx, heightPx }: { photoId: string; url: string; alt: string; widthPx: number; heightPx: number }) {
  const src = usePhotoSrc(photoId, url);
  const [view, setView] = useState<View>({ scale: 1, x: 0, y: 0 });
  const pointers = useRef(new Map<number, { x: number; y: number }>());
  const pinch = useRef<{ dist: number; scale: number } | null>(null);
  const lastTap = useRef(0);

  const set = (v: View) => setView(v.scale === 1 ? { scale: 1, x: 0, y: 0 } : v);
  const zoomBy = (f: number) => set({ ...view, scale: clampScale(view.scale * f) });

  const down = (e: PointerEvent<HTMLDivElement>) => {
    e.currentTarget.setPointerCapture(e.pointerId);
    pointers.current.set(e.pointerId, { x: e.clientX, y: e.clientY });
    if (pointers.current.size === 2) {
      const [a, b] = [...pointers.current.values()];
      pinch.current = { dist: Math.hypot(a!.x - b!.x, a!.y - b!.y), scale: view.scale };
    } else if (e.pointerType !== "mouse") {
      const now = Date.now();
      if (now - lastTap.current < 300) set(view.scale > 1 ? { scale: 1, x: 0, y: 0 } : { ...view, scale: 2.5 });
      lastTap.current = now;
    }
  };
  const move = (e: PointerEvent<HTMLDivElement>) => {
    const prev = pointers.current.get(e.pointerId);
    if (!prev) return;
    const next = { x: e.clientX, y: e.clientY };
    pointers.current.set(e.pointerId, next);
    if (pointers.current.size === 2 && pinch.current) {
      const [a, b] = [...pointers.current.values()];
      const dist = Math.hypot(a!.x - b!.x, a!.y - b!.y);
      set({ ...view, scale: clampScale((pinch.current.scale * dist) / (pinch.current.dist || 1)) });
    } else if (pointers.current.size === 1 && view.scale > 1) {
      set({ ...view, x: view.x + (next.x - prev.x), y: view.y + (next.y - prev.y) });
    }
  };
  const up = (e: PointerEvent<HTMLDivElement>) => {
    pointers.current.delete(e.pointerId);
    if (pointers.current.size < 2) pinch.current = null;
  };

  return (
    <figure className="relative overflow-hidden rounded-card border border-line bg-plum-950">
      <div
        className="flex aspect-[4/3] w-full touch-none items-center justify-center select-none"
        onPointerDown={down}
        onPointerMove={move}
        onPointerUp={up}
        onPointerCancel={up}
        onDoubleClick={() => set(view.scale > 1 ? { scale: 1, x: 0, y: 0 } : { ...view, scale: 2.5 })}
      >
        {src ? (
          // A blob URL from the tablet's store: next/image can't optimise it, and needn't.
          // eslint-disable-next-line @next/next/no-img-element
          <img
            src={src}
            alt={alt}
            width={widthPx}
            height={heightPx}
            draggable={false}
            className="max-h-full max-w-full object-contain will-change-transform"
            style={{ transform: `translate(${view.x}px, ${view.y}px) scale(${view.scale})` }}
          />
        ) : null}
      </div>
      <figcaption className="absolute right-2 bottom-2 flex gap-2">
        <ZoomButton label="Zoom out" onClick={() => zoomBy(1 / 1.5)} disabled={view.scale <= 1} icon={<Minus aria-hidden className="size-6" />} />
        <ZoomButton label="Zoom in" onClick={() => zoomBy(1.5)} disabled={view.scale >= MAX} icon={<Plus aria-hidden className="size-6" />} />
        <ZoomButton label="Fit the whole quilt" onClick={() => set({ scale: 1, x: 0, y: 0 })} disabled={view.scale === 1} icon={<RotateCcw aria-hidden className="size-6" />} />
      </figcaption>
    </figure>
  );
}

function ZoomButton({ label, onClick, disabled, icon }: { label: string; onClick: () => void; disabled: boolean; icon: React.ReactNode }) {
  return (
    <button
      type="button"
      aria-label={label}
      title={label}
      onClick={onClick}
      disabled={disabled}
      className="inline-flex size-tap-lg items-center justify-center rounded-full bg-white/90 text-plum-800 shadow-card disabled:opacity-40"
    >
      {icon}
    </button>
  );
}
