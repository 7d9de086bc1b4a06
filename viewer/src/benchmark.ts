/** Options of the in-page benchmark. */
export interface BenchmarkOptions {
  /** frames per measurement (default 60) */
  frames?: number;
  /** seconds of playing to count the achieved frame rate (default 3; 0 skips it) */
  playSeconds?: number;
}

/** Figures of the in-page benchmark, ms per frame (medians) and frames per second. */
export interface BenchmarkResult {
  stars: number;
  frames: number;
  width: number;
  height: number;
  /** a whole frame as the page renders it: evaluate every star, draw, put, overlays, panel */
  frameMs: number;
  /** evaluate and draw the stars only (no isochrone, overlays or panel) */
  starsMs: number;
  /** baseline: clear the buffer, fill the same number of fixed squares, put — no physics */
  baselineMs: number;
  /** frameMs / baselineMs */
  ratio: number;
  /** frames drawn per second while playing (requestAnimationFrame), or null when skipped */
  playFps: number | null;
}

/** What the benchmark drives: the page's own frame functions. */
export interface BenchmarkTarget {
  frame(t: number): void;
  starsOnly(t: number): void;
  fillFixed(xy: Int32Array, n: number): void;
  size(): { width: number; height: number };
  n: number;
  atFraction(f: number): number;
  play(on: boolean): void;
  playing(): boolean;
}

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : 0.5 * (s[m - 1] + s[m]);
};

const nextPaint = () => new Promise<number>((resolve) => requestAnimationFrame(resolve));

/**
 * Times the page's frame loop against a baseline in the same page and run: each measurement
 * sweeps the whole time span once in `frames` frames (after one unmeasured sweep to warm the
 * JIT), timing each frame with performance.now() and taking the median. Then it plays for
 * `playSeconds` and counts the frames drawn.
 */
export async function runBenchmark(target: BenchmarkTarget, options: BenchmarkOptions = {}): Promise<BenchmarkResult> {
  const frames = Math.max(4, Math.floor(options.frames ?? 60));
  const playSeconds = options.playSeconds ?? 3;
  const { width, height } = target.size();
  const xy = new Int32Array(2 * target.n);
  // fixed pseudo-random positions (a Weyl sequence), the same in every frame
  for (let s = 0; s < target.n; s++) {
    xy[2 * s] = Math.floor(((s * 0.6180339887498949) % 1) * width);
    xy[2 * s + 1] = Math.floor(((s * 0.7548776662466927) % 1) * height);
  }
  const measure = (fn: (t: number) => void): number => {
    for (let f = 0; f < frames; f++) fn(target.atFraction(f / (frames - 1)));
    const ms: number[] = [];
    for (let f = 0; f < frames; f++) {
      const t = target.atFraction(f / (frames - 1));
      const t0 = performance.now();
      fn(t);
      ms.push(performance.now() - t0);
    }
    return median(ms);
  };
  const baselineMs = measure(() => target.fillFixed(xy, target.n));
  const starsMs = measure((t) => target.starsOnly(t));
  const frameMs = measure((t) => target.frame(t));
  let playFps: number | null = null;
  if (playSeconds > 0) {
    target.frame(target.atFraction(0));
    await nextPaint();
    let count = 0;
    target.play(true);
    const t0 = await nextPaint();
    let t1 = t0;
    while (t1 - t0 < playSeconds * 1000 && target.playing()) {
      t1 = await nextPaint();
      count++;
    }
    target.play(false);
    playFps = count / ((t1 - t0) / 1000);
  }
  return { stars: target.n, frames, width, height, frameMs, starsMs, baselineMs, ratio: frameMs / baselineMs, playFps };
}
