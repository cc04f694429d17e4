// Photo processing under load: one 24-megapixel phone-sized JPEG through processPhoto, alone
// (median of 3) and 10 at once, with wall time and memory. Figures only; nothing passes or fails.
// Each phase runs in its own child process so its RSS high-water mark is its own, not the
// fixture generation's. Run alone with `npx tsx scripts/bench/photos.ts`.
import { fork } from "node:child_process";
import { rm, readFile, writeFile } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import sharp from "sharp";
import { processPhoto, type PhotoRules } from "../../storage/photo-processing";

const WIDTH_PX = 6000;
const HEIGHT_PX = 4000;
const PARALLEL = 10;
const RUNS = 3;
const rules: PhotoRules = { maxBytes: 50_000_000, minWidthPx: 1000, minHeightPx: 500 };
const CHILD_FLAG = "RIBBONRY_PHOTO_BENCH_CHILD";

type Phase = "single" | "single-rotated" | "parallel";
type PhaseResult = {
  phase: Phase;
  totalMs: number; // single*: median of RUNS; parallel: wall time for all PARALLEL
  perPhotoMs: number;
  baselineRssMb: number;
  peakRssOverBaselineMb: number; // sampled every 10 ms
  maxRssMb: number; // process.resourceUsage().maxRSS: the child's own high-water mark
};

export async function benchPhotos(): Promise<void> {
  const file = path.join(os.tmpdir(), `ribbonry-bench-${process.pid}-24mp.jpg`);
  const rotatedFile = path.join(os.tmpdir(), `ribbonry-bench-${process.pid}-24mp-o6.jpg`);
  const jpeg = await realisticJpeg();
  await writeFile(file, jpeg);
  await writeFile(rotatedFile, await withOrientation6(jpeg));
  try {
    const single = await runPhase("single", file);
    const rotated = await runPhase("single-rotated", rotatedFile);
    const parallel = await runPhase("parallel", file);
    console.log(`\nPhoto processing: ${WIDTH_PX} × ${HEIGHT_PX} JPEG (${(jpeg.length / 1e6).toFixed(1)} MB, q90) → original q90 + web 1600 + thumb 400`);
    console.log(`sharp concurrency ${sharp.concurrency()}, libuv pool ${process.env.UV_THREADPOOL_SIZE ?? "4 (default)"}, ${os.availableParallelism()} cores`);
    console.log(`${"".padEnd(24)} ${"wall ms".padStart(9)} ${"ms/photo".padStart(9)} ${"RSS peak Δ MB".padStart(14)} ${"maxRSS MB".padStart(10)} ${"baseline MB".padStart(12)}`);
    const rows = [
      [`1 photo (median of ${RUNS})`, single],
      [`1 photo, EXIF orient. 6`, rotated],
      [`${PARALLEL} at once`, parallel],
    ] as const;
    for (const [label, r] of rows) {
      console.log(
        `${label.padEnd(24)} ${r.totalMs.toFixed(0).padStart(9)} ${r.perPhotoMs.toFixed(0).padStart(9)} ` +
          `${r.peakRssOverBaselineMb.toFixed(0).padStart(14)} ${r.maxRssMb.toFixed(0).padStart(10)} ${r.baselineRssMb.toFixed(0).padStart(12)}`,
      );
    }
  } finally {
    await rm(file, { force: true });
    await rm(rotatedFile, { force: true });
  }
}

/** A smooth colour gradient with Gaussian noise over it: compresses like a detailed photo, not like a flat test card. */
async function realisticJpeg(): Promise<Buffer> {
  const corners = Buffer.from([200, 60, 40, 240, 200, 80, 60, 140, 90, 40, 70, 180, 120, 60, 160, 230, 230, 220]);
  const gradient = await sharp(corners, { raw: { width: 3, height: 2, channels: 3 } })
    .resize(WIDTH_PX, HEIGHT_PX, { kernel: "linear", fit: "fill" })
    .raw()
    .toBuffer();
  // With `noise` set, sharp ignores `background`; the type still asks for one.
  const noise = {
    create: { width: WIDTH_PX, height: HEIGHT_PX, channels: 3 as const, background: "#808080", noise: { type: "gaussian" as const, mean: 128, sigma: 30 } },
  };
  return sharp(gradient, { raw: { width: WIDTH_PX, height: HEIGHT_PX, channels: 3 } })
    .composite([{ input: noise, blend: "overlay" }])
    .jpeg({ quality: 90 })
    .toBuffer();
}

/**
 * The same photo as a phone held upright stores it: an EXIF block with Orientation 6 spliced in
 * after the JPEG's SOI marker (APP1 "Exif", CIPA DC-008), so processing must turn 24 MP a quarter turn.
 */
async function withOrientation6(jpeg: Buffer): Promise<Buffer> {
  const tiny = await sharp({ create: { width: 8, height: 8, channels: 3, background: "#888" } })
    .jpeg()
    .withMetadata({ orientation: 6 })
    .toBuffer();
  const app1 = tiny.indexOf(Buffer.from([0xff, 0xe1]));
  if (app1 < 0) throw new Error("photo bench: no APP1 segment in the orientation sample");
  const segment = tiny.subarray(app1, app1 + 2 + tiny.readUInt16BE(app1 + 2));
  return Buffer.concat([jpeg.subarray(0, 2), segment, jpeg.subarray(2)]);
}

function runPhase(phase: Phase, file: string): Promise<PhaseResult> {
  return new Promise((resolve, reject) => {
    const child = fork(fileURLToPath(import.meta.url), [phase, file], {
      execArgv: [...process.execArgv, "--expose-gc"],
      env: { ...process.env, [CHILD_FLAG]: "1" },
    });
    let result: PhaseResult | undefined;
    child.on("message", (m) => (result = m as PhaseResult));
    child.on("error", reject);
    child.on("exit", (code) => (result && code === 0 ? resolve(result) : reject(new Error(`photo bench ${phase} exited with ${code}`))));
  });
}

async function childMain(phase: Phase, file: string): Promise<void> {
  const input = await readFile(file);
  await processPhoto(input, rules); // warm-up: loads libvips code paths, JIT
  (globalThis as { gc?: () => void }).gc?.();
  const baseline = process.memoryUsage.rss();
  let peak = baseline;
  const sampler = setInterval(() => (peak = Math.max(peak, process.memoryUsage.rss())), 10);
  let totalMs: number;
  let perPhotoMs: number;
  if (phase !== "parallel") {
    const times: number[] = [];
    for (let i = 0; i < RUNS; i++) {
      const t0 = performance.now();
      await processPhoto(input, rules);
      times.push(performance.now() - t0);
    }
    totalMs = times.sort((a, b) => a - b)[Math.floor(RUNS / 2)]!;
    perPhotoMs = totalMs;
  } else {
    // Ten uploads arriving together, each with its own buffer as a request body would be.
    const inputs = Array.from({ length: PARALLEL }, () => Buffer.from(input));
    const t0 = performance.now();
    await Promise.all(inputs.map((b) => processPhoto(b, rules)));
    totalMs = performance.now() - t0;
    perPhotoMs = totalMs / PARALLEL;
  }
  clearInterval(sampler);
  peak = Math.max(peak, process.memoryUsage.rss());
  const mb = (bytes: number) => bytes / 1024 / 1024;
  const result: PhaseResult = {
    phase,
    totalMs,
    perPhotoMs,
    baselineRssMb: mb(baseline),
    peakRssOverBaselineMb: mb(peak - baseline),
    maxRssMb: process.resourceUsage().maxRSS / 1024, // reported in kilobytes
  };
  // Wait for the message to leave before the caller exits the process.
  const send = process.send?.bind(process);
  if (!send) throw new Error("photo bench child started without an IPC channel");
  await new Promise<void>((resolve, reject) => send(result, undefined, undefined, (err) => (err ? reject(err) : resolve())));
}

if (process.env[CHILD_FLAG] === "1") {
  childMain(process.argv[2] as Phase, process.argv[3]!).then(
    () => process.exit(0),
    (err) => {
      console.error("[photo bench]", err);
      process.exit(1);
    },
  );
} else if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  benchPhotos().catch((err) => {
    console.error("[photo bench]", err);
    process.exit(1);
  });
}
