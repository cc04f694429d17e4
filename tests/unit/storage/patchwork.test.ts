// The generated quilt photos: JPEG, exact sizes, the quilt's proportions, same seed → same bytes.
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { photoSizeFor, renderPatchwork } from "@/storage/patchwork";

// 1 in = 25,400 µm exactly (NIST SP 811, Appendix B).
const um = (inches: number) => inches * 25_400;

describe("renderPatchwork", () => {
  it("renders a full view as a JPEG whose proportions are the quilt's width × length", async () => {
    // A portrait quilt, 60½ × 72¼ in: long side 1200 px, width 1200 × 60.5 / 72.25 = 1004.8 → 1005.
    const size = photoSizeFor(um(60.5), um(72.25), "full");
    expect(size).toEqual({ widthPx: 1005, heightPx: 1200 });
    const meta = await sharp(await renderPatchwork({ seed: 7, ...size, view: "full" })).metadata();
    expect(meta.format).toBe("jpeg");
    expect([meta.width, meta.height]).toEqual([1005, 1200]);
    expect(Math.abs(meta.width / meta.height - 60.5 / 72.25)).toBeLessThan(1 / 1200);
  });

  it("keeps a landscape quilt landscape", async () => {
    // 44 × 30 in: 1200 × (1200 × 30 / 44 = 818.2 → 818).
    const size = photoSizeFor(um(44), um(30), "full");
    expect(size).toEqual({ widthPx: 1200, heightPx: 818 });
    const meta = await sharp(await renderPatchwork({ seed: 8, ...size, view: "full" })).metadata();
    expect([meta.format, meta.width, meta.height]).toEqual(["jpeg", 1200, 818]);
  });

  it("renders a square detail view of 1000 × 1000 px whatever the quilt's shape", async () => {
    const size = photoSizeFor(um(96), um(104), "detail");
    expect(size).toEqual({ widthPx: 1000, heightPx: 1000 });
    const meta = await sharp(await renderPatchwork({ seed: 9, ...size, view: "detail" })).metadata();
    expect([meta.format, meta.width, meta.height]).toEqual(["jpeg", 1000, 1000]);
  });

  it("gives the same bytes for the same seed and different ones for another seed", async () => {
    const opts = { widthPx: 900, heightPx: 1200, view: "full" as const };
    const a = await renderPatchwork({ seed: 42, ...opts });
    const b = await renderPatchwork({ seed: 42, ...opts });
    const c = await renderPatchwork({ seed: 43, ...opts });
    expect(a.equals(b)).toBe(true);
    expect(a.equals(c)).toBe(false);

    const d1 = await renderPatchwork({ seed: 42, widthPx: 1000, heightPx: 1000, view: "detail" });
    const d2 = await renderPatchwork({ seed: 42, widthPx: 1000, heightPx: 1000, view: "detail" });
    const d3 = await renderPatchwork({ seed: 44, widthPx: 1000, heightPx: 1000, view: "detail" });
    expect(d1.equals(d2)).toBe(true);
    expect(d1.equals(d3)).toBe(false);
  });

  it("refuses sizes that are not whole pixels", async () => {
    await expect(renderPatchwork({ seed: 1, widthPx: 100.5, heightPx: 100, view: "full" })).rejects.toThrow(/whole pixels/);
  });
});
