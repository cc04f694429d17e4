// Draws a made-up patchwork quilt as SVG and renders it to JPEG: stand-in photos for the demo
// data and for tests. Deliberately free of "server-only" so tsx scripts and vitest can import it.
import sharp from "sharp";

export type PatchworkView = "full" | "detail";

export interface PatchworkOptions {
  seed: number;
  widthPx: number;
  heightPx: number;
  view: PatchworkView;
}

/** Long side of a generated full view, and the square size of a detail view. */
export const FULL_LONG_SIDE_PX = 1200;
export const DETAIL_SIDE_PX = 1000;

/** Pixel size of a photo of a quilt: the full view keeps the quilt's width × length ratio. */
export function photoSizeFor(
  widthUm: number,
  lengthUm: number,
  view: PatchworkView,
): { widthPx: number; heightPx: number } {
  if (view === "detail") return { widthPx: DETAIL_SIDE_PX, heightPx: DETAIL_SIDE_PX };
  if (widthUm >= lengthUm) {
    return { widthPx: FULL_LONG_SIDE_PX, heightPx: Math.max(1, Math.round((FULL_LONG_SIDE_PX * lengthUm) / widthUm)) };
  }
  return { widthPx: Math.max(1, Math.round((FULL_LONG_SIDE_PX * widthUm) / lengthUm)), heightPx: FULL_LONG_SIDE_PX };
}

interface Palette {
  name: string;
  background: string;
  prints: string[];
  border: string;
  binding: string;
  thread: string;
}

// Invented colourways; none is a real fabric line.
const PALETTES: Palette[] = [
  { name: "Rhubarb Jam", background: "#f6efe4", prints: ["#b23a48", "#e07a5f", "#f2cc8f", "#81b29a", "#3d405b"], border: "#7a1f2b", binding: "#3d405b", thread: "#fff8ee" },
  { name: "Creek Stones", background: "#eef0ea", prints: ["#5b7065", "#8aa29e", "#c9b79c", "#6d5a4b", "#304040"], border: "#304040", binding: "#6d5a4b", thread: "#f4f1e8" },
  { name: "Marigold Porch", background: "#fff7e0", prints: ["#e9a03b", "#d1603d", "#2f6690", "#3a7d44", "#f4d35e"], border: "#2f6690", binding: "#d1603d", thread: "#fffdf5" },
  { name: "Indigo Night", background: "#f1f3f8", prints: ["#1d3557", "#457b9d", "#a8dadc", "#e63946", "#2b2d42"], border: "#1d3557", binding: "#e63946", thread: "#eef4ff" },
  { name: "Sage Kitchen", background: "#f4f5ee", prints: ["#9caf88", "#5f7161", "#e9c46a", "#d4a373", "#6b4f3a"], border: "#5f7161", binding: "#6b4f3a", thread: "#fbfaf2" },
  { name: "Plum Orchard", background: "#f8f0f4", prints: ["#6a2c70", "#b83b5e", "#f08a5d", "#f9ed69", "#3f3b6c"], border: "#3f3b6c", binding: "#6a2c70", thread: "#fff5fa" },
  { name: "Harbour Fog", background: "#eef2f3", prints: ["#6c8ea4", "#b7c9d3", "#f2a65a", "#4a4e69", "#9a8c98"], border: "#4a4e69", binding: "#f2a65a", thread: "#ffffff" },
  { name: "Pumpkin Patch", background: "#fbf3e6", prints: ["#c8553d", "#f28f3b", "#588b8b", "#ffd5c2", "#2d3047"], border: "#2d3047", binding: "#c8553d", thread: "#fff9f0" },
];

type BlockKind = "hst" | "pinwheel" | "fourPatch" | "ninePatch" | "stripes" | "squareInSquare";
const BLOCK_KINDS: BlockKind[] = ["hst", "pinwheel", "fourPatch", "ninePatch", "stripes", "squareInSquare"];

/** mulberry32: a tiny, fast, seedable PRNG (same seed, same picture). */
function prng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const f = (n: number) => (Math.round(n * 10) / 10).toString();

function rect(x: number, y: number, w: number, h: number, fill: string): string {
  return `<rect x="${f(x)}" y="${f(y)}" width="${f(w)}" height="${f(h)}" fill="${fill}"/>`;
}

function poly(points: [number, number][], fill: string): string {
  return `<polygon points="${points.map(([x, y]) => `${f(x)},${f(y)}`).join(" ")}" fill="${fill}"/>`;
}

/** One block in the box (x, y, w, h); `turn` rotates the design a quarter at a time. */
function block(kind: BlockKind, x: number, y: number, w: number, h: number, a: string, b: string, bg: string, turn: number): string {
  const corners: [number, number][] = [
    [x, y],
    [x + w, y],
    [x + w, y + h],
    [x, y + h],
  ];
  const c = (i: number) => corners[(i + turn) % 4]!;
  switch (kind) {
    case "hst":
      return rect(x, y, w, h, bg) + poly([c(0), c(1), c(2)], a);
    case "pinwheel": {
      const mx = x + w / 2;
      const my = y + h / 2;
      return (
        rect(x, y, w, h, bg) +
        poly([[x, y], [mx, y], [mx, my]], a) +
        poly([[x + w, y], [x + w, my], [mx, my]], b) +
        poly([[x + w, y + h], [mx, y + h], [mx, my]], a) +
        poly([[x, y + h], [x, my], [mx, my]], b)
      );
    }
    case "fourPatch": {
      const hw = w / 2;
      const hh = h / 2;
      const [p, q] = turn % 2 ? [a, b] : [b, a];
      return rect(x, y, hw, hh, p) + rect(x + hw, y, hw, hh, q) + rect(x, y + hh, hw, hh, q) + rect(x + hw, y + hh, hw, hh, p);
    }
    case "ninePatch": {
      let out = "";
      for (let i = 0; i < 3; i++) {
        for (let j = 0; j < 3; j++) out += rect(x + (i * w) / 3, y + (j * h) / 3, w / 3, h / 3, (i + j) % 2 ? bg : i === 1 && j === 1 ? b : a);
      }
      return out;
    }
    case "stripes": {
      const colours = [a, bg, b];
      let out = "";
      for (let i = 0; i < 3; i++) {
        out += turn % 2 ? rect(x + (i * w) / 3, y, w / 3, h, colours[i]!) : rect(x, y + (i * h) / 3, w, h / 3, colours[i]!);
      }
      return out;
    }
    case "squareInSquare": {
      const mx = x + w / 2;
      const my = y + h / 2;
      return (
        rect(x, y, w, h, a) +
        poly([[mx, y], [x + w, my], [mx, y + h], [x, my]], bg) +
        rect(x + w / 4 + w / 16, y + h / 4 + h / 16, w / 2 - w / 8, h / 2 - h / 8, b)
      );
    }
  }
}

interface QuiltPlan {
  palette: Palette;
  cols: number;
  rows: number;
  kinds: BlockKind[];
  cells: { kind: BlockKind; a: string; b: string; turn: number }[];
}

/** Everything random about a quilt, drawn once from the seed so both views show the same quilt. */
function planQuilt(seed: number, cols: number, rows: number): QuiltPlan {
  const rand = prng(seed);
  const pick = <T>(xs: T[]): T => xs[Math.floor(rand() * xs.length)]!;
  const palette = pick(PALETTES);
  // Two or three block designs per quilt, like a real sampler of a few blocks.
  const kinds = [pick(BLOCK_KINDS), pick(BLOCK_KINDS), pick(BLOCK_KINDS)].slice(0, 2 + Math.floor(rand() * 2));
  const cells: QuiltPlan["cells"] = [];
  for (let r = 0; r < rows; r++) {
    for (let c = 0; c < cols; c++) {
      cells.push({ kind: kinds[(r + c) % kinds.length]!, a: pick(palette.prints), b: pick(palette.prints), turn: Math.floor(rand() * 4) });
    }
  }
  return { palette, cols, rows, kinds, cells };
}

function fullSvg(seed: number, W: number, H: number): string {
  const short = Math.min(W, H);
  const binding = Math.max(3, short * 0.012);
  const border = short * 0.07;
  const innerX = binding + border;
  const innerY = binding + border;
  const innerW = W - 2 * innerX;
  const innerH = H - 2 * innerY;
  const target = short / 7;
  const cols = Math.max(2, Math.round(innerW / target));
  const rows = Math.max(2, Math.round(innerH / target));
  const plan = planQuilt(seed, cols, rows);
  const bw = innerW / cols;
  const bh = innerH / rows;
  const parts: string[] = [rect(0, 0, W, H, plan.palette.binding), rect(binding, binding, W - 2 * binding, H - 2 * binding, plan.palette.border)];
  plan.cells.forEach((cell, i) => {
    const x = innerX + (i % cols) * bw;
    const y = innerY + Math.floor(i / cols) * bh;
    parts.push(block(cell.kind, x, y, bw, bh, cell.a, cell.b, plan.palette.background, cell.turn));
  });
  // Faint seam lines between blocks, as a photo shows them.
  const seams: string[] = [];
  for (let c = 1; c < cols; c++) seams.push(`M${f(innerX + c * bw)} ${f(innerY)}V${f(innerY + innerH)}`);
  for (let r = 1; r < rows; r++) seams.push(`M${f(innerX)} ${f(innerY + r * bh)}H${f(innerX + innerW)}`);
  parts.push(`<path d="${seams.join("")}" stroke="#000" stroke-opacity="0.12" stroke-width="1" fill="none"/>`);
  return svgDoc(W, H, parts.join(""));
}

function detailSvg(seed: number, W: number, H: number): string {
  const plan = planQuilt(seed, 4, 4);
  // About two and a half blocks across, starting a little inside the first block.
  const bs = W / 2.5;
  const offset = prng(seed ^ 0x9e3779b9)() * bs * 0.5;
  const parts: string[] = [rect(0, 0, W, H, plan.palette.background)];
  const seams: string[] = [];
  plan.cells.forEach((cell, i) => {
    const x = (i % 4) * bs - offset;
    const y = Math.floor(i / 4) * bs - offset;
    if (x > W || y > H) return;
    parts.push(block(cell.kind, x, y, bs, bs, cell.a, cell.b, plan.palette.background, cell.turn));
  });
  for (let k = 1; k < 4; k++) {
    seams.push(`M${f(k * bs - offset)} 0V${H}`, `M0 ${f(k * bs - offset)}H${W}`);
  }
  parts.push(`<path d="${seams.join("")}" stroke="#000" stroke-opacity="0.18" stroke-width="2" fill="none"/>`);
  // Quilting: a diagonal crosshatch and stitches in the ditch, drawn as dashed thread.
  const step = bs / 4;
  const hatch: string[] = [];
  for (let d = -H; d < W + H; d += step) {
    hatch.push(`M${f(d)} 0L${f(d + H)} ${H}`, `M${f(d)} ${H}L${f(d + H)} 0`);
  }
  parts.push(
    // The soft shadow of the quilted dip goes under the thread.
    `<path d="${hatch.join("")}" stroke="#000" stroke-opacity="0.10" stroke-width="7" fill="none" transform="translate(2 3)"/>`,
    `<path d="${hatch.join("")}" stroke="${plan.palette.thread}" stroke-opacity="0.85" stroke-width="3" stroke-dasharray="12 7" stroke-linecap="round" fill="none"/>`,
    `<path d="${seams.join("")}" stroke="${plan.palette.thread}" stroke-width="3" stroke-dasharray="10 6" transform="translate(6 6)" fill="none"/>`,
  );
  return svgDoc(W, H, parts.join(""));
}

function svgDoc(W: number, H: number, body: string): string {
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${W}" height="${H}" viewBox="0 0 ${W} ${H}">${body}</svg>`;
}

/** A JPEG (quality 80) of a patchwork quilt drawn from `seed`, exactly widthPx × heightPx. */
export async function renderPatchwork(opts: PatchworkOptions): Promise<Buffer> {
  const { seed, widthPx, heightPx, view } = opts;
  if (!Number.isInteger(widthPx) || !Number.isInteger(heightPx) || widthPx < 16 || heightPx < 16) {
    throw new Error(`renderPatchwork: size must be whole pixels of at least 16, got ${widthPx} × ${heightPx}`);
  }
  const svg = view === "full" ? fullSvg(seed, widthPx, heightPx) : detailSvg(seed, widthPx, heightPx);
  return sharp(Buffer.from(svg))
    .resize(widthPx, heightPx, { fit: "fill" })
    .jpeg({ quality: 80 })
    .toBuffer();
}
