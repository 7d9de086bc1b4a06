// The viewer page: an adapter that asks the library for numbers and draws them.
import { formatSignificant } from '../../lib/io/formatSignificant.js';
import { formatStateValue } from '../../lib/io/formatStateValue.js';
import type { ViewerPayload } from '../../lib/io/viewerPayload.js';
import { decodeViewerGrid, readViewerPayload } from '../../lib/io/viewerPayloadRead.js';
import { interpolatedTrack, type InterpolatedTrack } from '../../lib/interp/interpolatedTrack.js';
import { isochrone, type Isochrone } from '../../lib/interp/isochrone.js';
import { PHASES, PHASE_INDEX, type Phase } from '../../lib/model/phases.js';
import type { StarState } from '../../lib/model/starState.js';
import type { Grid } from '../../lib/tracks/grid.js';
import { runBenchmark, type BenchmarkOptions, type BenchmarkResult } from './benchmark.js';
import { createColorTable, type ColorTable } from './colorTable.js';
import { createDiagramChart, type DiagramChart, type Overlay, type Ring } from './diagramChart.js';
import { computeHistory, createHistoryChart, type History, type HistoryChart } from './historyChart.js';
import { PHASE_COLORS } from './phaseStyle.js';
import { COUNT_SLOTS, createPopulation, OUTSIDE, UNBORN, type Population } from './population.js';
import { CMD_VIEW, HR_VIEW, type DiagramKind } from './starLayer.js';
import { createTimeGrid, type TimeGrid } from './timeGrid.js';

/** What `window.starclockViewer.state()` reports. */
export interface ViewerState {
  /** the clock: yr since star formation began (scenario) or offset from the table's present (table) */
  time: number;
  /** yr since the population's origin */
  elapsed: number;
  label: string;
  playing: boolean;
  diagram: DiagramKind;
  /** stars per phase at this time (every phase, zeros included) */
  counts: Record<Phase, number>;
  /** stars not born yet at this time */
  unborn: number;
  /** stars the grid cannot answer at this time (older than the model's 100 Gyr) */
  outsideModel: number;
  /** stars drawn in the diagram (black holes and unborn stars are not) */
  drawn: number;
  /** Msun, or null before the first star is born */
  turnoffMass: number | null;
  /** the chosen star (track overlay), by its position in the input */
  chosen: number | null;
}

/** The automation hook, `window.starclockViewer`. */
export interface ViewerHook {
  /** resolves when the first frame is drawn and the counts over time are computed */
  ready: Promise<void>;
  /** shows time `yr` on the page's clock (see ViewerState.time) and draws that frame now */
  setTime(yr: number): void;
  state(): ViewerState;
  play(): void;
  pause(): void;
  /** where star `index` (its position in the input) is drawn now, in CSS px of the page, or null when it is not drawn */
  locate(index: number): { x: number; y: number } | null;
  /** times the frame loop against a pixel-fill baseline (bench/viewer.ts) */
  benchmark(options?: BenchmarkOptions): Promise<BenchmarkResult>;
}

declare global {
  interface Window {
    starclockViewer: ViewerHook;
  }
}

const $ = <T extends HTMLElement>(id: string): T => {
  const el = document.getElementById(id);
  if (!el) throw new Error(`viewer page is missing #${id}`);
  return el as T;
};

const HOVER_RADIUS_CSS = 6;
const SLIDER_MAX = 10000;

class Viewer {
  readonly counts = new Int32Array(COUNT_SLOTS);
  kind: DiagramKind = 'hr';
  chart!: DiagramChart;
  historyChart!: HistoryChart;
  t: number;
  playing = false;
  speed = 10;
  drawnCount = 0;
  rendered = false;
  iso: Isochrone | null = null;
  chosen = -1;
  hovered = -1;
  pinned = -1;
  track: InterpolatedTrack | null = null;
  private lastFrame = 0;
  private pos = 0;
  private readonly countCells = new Map<number, { row: HTMLTableRowElement; cell: HTMLTableCellElement; last: number }>();
  private readonly massRange: { min: number; max: number };

  constructor(
    readonly payload: ViewerPayload,
    readonly grid: Grid,
    readonly pop: Population,
    readonly lut: ColorTable,
    readonly timeGrid: TimeGrid,
    readonly history: History,
  ) {
    this.t = payload.time.start;
    this.massRange = payload.massLimits;
    // the default chosen star: the one nearest 1 Msun in log mass (a Sun-like life)
    let best = Infinity;
    for (let k = 0; k < pop.n; k++) {
      const d = Math.abs(Math.log(pop.initialMass[k]));
      if (d < best) {
        best = d;
        this.chosen = k;
      }
    }
  }

  diagramSize(): { width: number; height: number } {
    const width = Math.max(420, Math.min(1100, $('diagram-panel').clientWidth - 2));
    // room for the controls and the chart of counts below it on one screen
    return { width, height: Math.round(Math.max(320, Math.min(620, width * 0.62, window.innerHeight - 400))) };
  }

  buildDiagram(): void {
    this.chart?.destroy();
    const el = $('diagram');
    el.textContent = '';
    const { width, height } = this.diagramSize();
    this.chart = createDiagramChart(el, this.kind === 'hr' ? HR_VIEW : CMD_VIEW, this.lut, this.pop.n, width, height, () => {
      if (this.rendered) this.render(this.t);
    });
    const over = this.chart.plot.over;
    over.addEventListener('mousemove', (e) => this.hover(e.offsetX, e.offsetY));
    over.addEventListener('mouseleave', () => {
      this.hovered = -1;
      this.showInfo();
    });
    over.addEventListener('click', (e) => {
      const s = this.chart.nearest(e.offsetX, e.offsetY, HOVER_RADIUS_CSS);
      this.pinned = s;
      if (s >= 0) {
        this.chosen = s;
        this.track = null;
      }
      this.render(this.t);
    });
  }

  buildHistory(): void {
    this.historyChart?.plot.destroy();
    const el = $('history');
    el.textContent = '';
    const width = Math.max(420, Math.min(1500, $('history-panel').clientWidth - 2));
    this.historyChart = createHistoryChart(el, this.history, this.timeGrid, this.payload.time.spacing === 'log', width);
  }

  buildCounts(): void {
    const body = $('counts').querySelector('tbody') as HTMLTableSectionElement;
    const rows: [number, string, string][] = PHASES.map((p, i) => [i, p, PHASE_COLORS[p]]);
    rows.push([UNBORN, 'not yet born', 'transparent'], [OUTSIDE, 'beyond the model (over 100 Gyr)', 'transparent']);
    for (const [slot, label, color] of rows) {
      const row = document.createElement('tr');
      row.dataset.phase = slot < PHASES.length ? label : slot === UNBORN ? 'unborn' : 'outside';
      const name = document.createElement('td');
      const swatch = document.createElement('span');
      swatch.className = 'swatch';
      swatch.style.background = color;
      name.append(swatch, document.createTextNode(slot === PHASE_INDEX['black-hole'] ? `${label} (no light; not drawn)` : label));
      const cell = document.createElement('td');
      cell.className = 'num';
      row.append(name, cell);
      body.append(row);
      this.countCells.set(slot, { row, cell, last: -1 });
    }
  }

  render(t: number): void {
    this.rendered = true;
    const { pop, counts } = this;
    this.t = Math.min(this.timeGrid.to, Math.max(this.timeGrid.from, t));
    pop.evaluate(this.t, counts);
    this.drawnCount = this.chart.drawStars(pop.columns, pop.n);
    this.updateIsochrone();
    this.updateOverlays();
    this.historyChart.setCurrent(this.t);
    this.updatePanel();
  }

  private updateIsochrone(): void {
    const age = this.t - this.pop.firstBirth;
    this.iso = null;
    const { min, max } = this.massRange;
    if (!(age > 0) || !(max > min)) return;
    try {
      this.iso = isochrone(this.pop.query, age, this.payload.isochroneZ, { count: 150, minMass: min, maxMass: max });
    } catch (error) {
      if (!(error instanceof RangeError)) throw error;
    }
  }

  private point(state: { luminosity: number; teff: number; bv: number | null; mv: number | null }): [number, number] {
    if (!(state.luminosity > 0 && state.teff > 0)) return [NaN, NaN];
    if (this.kind === 'hr') return [Math.log10(state.teff), Math.log10(state.luminosity)];
    return [state.bv ?? NaN, state.mv ?? NaN];
  }

  private updateOverlays(): void {
    const lines: Overlay[] = [];
    const rings: Ring[] = [];
    const showIso = ($('show-isochrone') as HTMLInputElement).checked;
    const showTrack = ($('show-track') as HTMLInputElement).checked;
    if (showIso && this.iso) {
      const pts = this.iso.points;
      const x = new Float64Array(pts.length);
      const y = new Float64Array(pts.length);
      let prevRemnant = false;
      for (let i = 0; i < pts.length; i++) {
        const p = pts[i];
        const remnant = p.phase === 'white-dwarf' || p.phase === 'neutron-star' || p.phase === 'black-hole';
        // no line across the jump from the giant tip to the remnants, and none through neutron stars
        const [vx, vy] = p.phase === 'neutron-star' || (i > 0 && remnant !== prevRemnant) ? [NaN, NaN] : this.point(p);
        x[i] = vx;
        y[i] = vy;
        prevRemnant = remnant;
      }
      lines.push({ x, y, stroke: 'rgba(255,207,110,0.6)', width: 1.25, dash: [] });
    }
    if (this.chosen >= 0 && showTrack) {
      const k = this.chosen;
      const z = typeof this.pop.z === 'number' ? this.pop.z : this.pop.z[k];
      this.track ??= interpolatedTrack(this.grid, this.pop.initialMass[k], z);
      const tr = this.track;
      const x = new Float64Array(tr.n);
      const y = new Float64Array(tr.n);
      const ns = PHASE_INDEX['neutron-star'];
      const bh = PHASE_INDEX['black-hole'];
      for (let j = 0; j < tr.n; j++) {
        if (tr.phase[j] === ns || tr.phase[j] === bh) {
          x[j] = NaN;
          y[j] = NaN;
        } else if (this.kind === 'hr') {
          x[j] = tr.logTeff[j];
          y[j] = tr.logL[j];
        } else {
          x[j] = this.lut.bvAt(tr.logTeff[j]);
          y[j] = this.lut.mvAt(tr.logTeff[j], tr.logL[j]);
        }
      }
      lines.push({ x, y, stroke: 'rgba(127,224,200,0.85)', width: 1.25, dash: [5, 3] });
    }
    for (const [s, stroke] of [[this.chosen, '#7fe0c8'], [this.hovered, '#ffffff']] as const) {
      if (s < 0 || this.pop.columns.status[s] !== 0) continue;
      const c = this.pop.columns;
      if (c.phase[s] === PHASE_INDEX['black-hole']) continue;
      const lt = Math.log10(c.teff[s]);
      const [x, y] = this.point({ luminosity: c.luminosity[s], teff: c.teff[s], bv: this.lut.bvAt(lt), mv: this.lut.mvAt(lt, Math.log10(c.luminosity[s])) });
      rings.push({ x, y, stroke });
    }
    this.chart.setOverlays(lines, rings);
  }

  private updatePanel(): void {
    $('time-label').textContent = this.timeGrid.label(this.t);
    const iso = this.iso;
    $('turnoff').textContent = iso === null ? '—'
      : iso.turnoffMass >= this.massRange.max ? `≥ ${formatSignificant(this.massRange.max, 3, true)} Msun`
      : iso.turnoffMass <= this.massRange.min ? `≤ ${formatSignificant(this.massRange.min, 3, true)} Msun`
      : `${formatSignificant(iso.turnoffMass, 3, true)} Msun`;
    for (const [slot, entry] of this.countCells) {
      const v = this.counts[slot];
      if (v === entry.last) continue;
      entry.last = v;
      entry.cell.textContent = String(v);
      entry.row.classList.toggle('zero', v === 0);
      if (slot >= PHASES.length) entry.row.hidden = v === 0;
    }
    const slider = $('time-slider') as HTMLInputElement;
    const value = String(Math.round(this.timeGrid.fraction(this.t) * SLIDER_MAX));
    if (slider.value !== value) slider.value = value;
    $('play').textContent = this.playing ? 'pause' : 'play';
    this.showInfo();
  }

  hover(cssX: number, cssY: number): void {
    const s = this.chart.nearest(cssX, cssY, HOVER_RADIUS_CSS);
    if (s === this.hovered) return;
    this.hovered = s;
    this.updateOverlays();
    this.showInfo();
  }

  private infoTerms = '';
  private infoCells: HTMLElement[] = [];

  /** Fills the star panel (textContent only: names come from user files). */
  showInfo(): void {
    const s = this.hovered >= 0 ? this.hovered : this.pinned >= 0 ? this.pinned : this.chosen;
    ($('star-info').querySelector('.hint') as HTMLElement).hidden = s >= 0;
    const rows = s >= 0 ? this.infoRows(s) : [];
    const terms = rows.map((r) => r[0]).join('\n');
    if (terms !== this.infoTerms) {
      // a new set of rows: rebuild the list; else only the values change (no new elements per frame)
      const dl = $('star-info').querySelector('dl') as HTMLDListElement;
      dl.textContent = '';
      this.infoCells = rows.map(([term]) => {
        const dt = document.createElement('dt');
        dt.textContent = term;
        const dd = document.createElement('dd');
        dl.append(dt, dd);
        return dd;
      });
      this.infoTerms = terms;
    }
    rows.forEach(([, value], i) => {
      if (this.infoCells[i].textContent !== value) this.infoCells[i].textContent = value;
    });
  }

  private infoRows(s: number): [string, string][] {
    const rows: [string, string][] = [];
    const add = (term: string, value: string) => rows.push([term, value]);
    const i = this.pop.inputIndex[s];
    const names = this.payload.stars.name;
    add('name', names ? names[i] : `star ${i + 1}`);
    if (names) add('row', String(i + 1));
    const m = this.pop.initialMass[s];
    const z = typeof this.pop.z === 'number' ? this.pop.z : this.pop.z[s];
    const age = this.t - this.pop.birthTime[s];
    if (age < 0) {
      const a = formatStateValue('age', -age);
      add('state', `not born yet (in ${a.text} ${a.unit})`);
      add('initialMass', `${formatSignificant(m, 4, true)} Msun`);
      return rows;
    }
    let st: StarState;
    try {
      st = this.pop.query.star(m, age, z);
    } catch (error) {
      add('state', (error as Error).message);
      return rows;
    }
    const keys: (keyof StarState)[] = ['phase', 'spectralType', 'initialMass', 'mass', 'age', 'z', 'luminosity', 'teff', 'radius', 'mv', 'bv', 'remnant'];
    for (const key of keys) {
      const f = formatStateValue(key, st[key] as never);
      add(key, f.unit && f.text !== '—' ? `${f.text} ${f.unit}` : f.text);
    }
    return rows;
  }

  setPlaying(on: boolean): void {
    if (on && this.t >= this.timeGrid.to) this.t = this.timeGrid.from;
    this.playing = on;
    $('play').textContent = on ? 'pause' : 'play';
    if (on) {
      this.pos = this.timeGrid.fraction(this.t) * (this.timeGrid.times.length - 1);
      this.lastFrame = performance.now();
      requestAnimationFrame((now) => this.tick(now));
    }
  }

  private tick(now: number): void {
    if (!this.playing) return;
    const dt = Math.min(0.25, (now - this.lastFrame) / 1000);
    this.lastFrame = now;
    const last = this.timeGrid.times.length - 1;
    this.pos = Math.min(last, this.pos + this.speed * dt);
    this.render(this.timeGrid.atFraction(this.pos / last));
    if (this.pos >= last) this.setPlaying(false);
    else requestAnimationFrame((n) => this.tick(n));
  }

  step(dir: 1 | -1): void {
    this.render(this.timeGrid.step(this.t, dir));
    if (this.playing) this.pos = this.timeGrid.fraction(this.t) * (this.timeGrid.times.length - 1);
  }

  state(): ViewerState {
    const counts = {} as Record<Phase, number>;
    PHASES.forEach((p, i) => {
      counts[p] = this.counts[i];
    });
    return {
      time: this.timeGrid.clock(this.t),
      elapsed: this.t,
      label: this.timeGrid.label(this.t),
      playing: this.playing,
      diagram: this.kind,
      counts,
      unborn: this.counts[UNBORN],
      outsideModel: this.counts[OUTSIDE],
      drawn: this.drawnCount,
      turnoffMass: this.iso ? this.iso.turnoffMass : null,
      chosen: this.chosen >= 0 ? this.pop.inputIndex[this.chosen] : null,
    };
  }

  locate(index: number): { x: number; y: number } | null {
    if (!(Number.isInteger(index) && index >= 0 && index < this.pop.n)) {
      throw new RangeError(`locate: star ${index} outside 0–${this.pop.n - 1}`);
    }
    let s = -1;
    for (let k = 0; k < this.pop.n; k++) if (this.pop.inputIndex[k] === index) s = k;
    if (s < 0 || this.chart.drawn.mark[s] === 0) return null;
    const rect = this.chart.plot.over.getBoundingClientRect();
    const r = devicePixelRatio;
    return { x: rect.left + (this.chart.drawn.x[s] + 0.5) / r, y: rect.top + (this.chart.drawn.y[s] + 0.5) / r };
  }

  wireControls(): void {
    $('play').addEventListener('click', () => this.setPlaying(!this.playing));
    $('step-back').addEventListener('click', () => this.step(-1));
    $('step-forward').addEventListener('click', () => this.step(1));
    const slider = $('time-slider') as HTMLInputElement;
    slider.addEventListener('input', () => {
      this.render(this.timeGrid.atFraction(Number(slider.value) / SLIDER_MAX));
      if (this.playing) this.pos = this.timeGrid.fraction(this.t) * (this.timeGrid.times.length - 1);
    });
    const speed = $('speed') as HTMLSelectElement;
    speed.addEventListener('change', () => {
      this.speed = Number(speed.value);
    });
    this.speed = Number(speed.value);
    document.querySelectorAll<HTMLInputElement>('input[name="diagram"]').forEach((radio) => {
      radio.addEventListener('change', () => {
        if (!radio.checked) return;
        this.kind = radio.value === 'cmd' ? 'cmd' : 'hr';
        this.buildDiagram();
        this.render(this.t);
      });
    });
    for (const id of ['show-isochrone', 'show-track']) $(id).addEventListener('change', () => this.updateOverlays());
    const typing = (target: EventTarget | null) =>
      target instanceof HTMLSelectElement || target instanceof HTMLTextAreaElement ||
      (target instanceof HTMLInputElement && target.type !== 'range');
    document.addEventListener('keydown', (e) => {
      if (e.altKey || e.ctrlKey || e.metaKey || typing(e.target)) return;
      if (e.key === ' ') {
        e.preventDefault();
        if (!e.repeat) this.setPlaying(!this.playing);
      } else if (e.key === 'ArrowRight' || e.key === 'ArrowUp') {
        e.preventDefault();
        this.step(1);
      } else if (e.key === 'ArrowLeft' || e.key === 'ArrowDown') {
        e.preventDefault();
        this.step(-1);
      }
    });
    // a focused button would also be clicked by the space key's release
    document.addEventListener('keyup', (e) => {
      if (e.key === ' ' && !typing(e.target)) e.preventDefault();
    });
    let resizeTimer = 0;
    window.addEventListener('resize', () => {
      clearTimeout(resizeTimer);
      resizeTimer = window.setTimeout(() => {
        this.buildDiagram();
        this.buildHistory();
        this.render(this.t);
      }, 150);
    });
  }
}

function describe(payload: ViewerPayload): string {
  const n = payload.stars.initialMass.length;
  const what = payload.source === 'scenario' ? 'scenario' : 'table';
  const clock = payload.time.clock === 'offset' ? 'time is shown relative to the table\u2019s present' : 'time since star formation began';
  return `${n.toLocaleString('en')} stars from a ${what}; ${clock}. Every frame is computed in this page by the starclock library.`;
}

async function start(): Promise<Viewer> {
  const payload = readViewerPayload($('starclock-data').textContent ?? '');
  document.title = `${payload.title} — starclock viewer`;
  $('title').textContent = payload.title;
  $('subtitle').textContent = describe(payload);
  const grid = await decodeViewerGrid(payload.grid);
  const pop = createPopulation(grid, payload.stars);
  const timeGrid = createTimeGrid(payload.time);
  const progress = $('history-progress');
  let viewer: Viewer | undefined;
  const history = computeHistory(pop, timeGrid, (done) => {
    progress.textContent = done < timeGrid.times.length ? `(computing: ${done} of ${timeGrid.times.length} times)` : '';
    viewer?.historyChart.refresh();
  });
  viewer = new Viewer(payload, grid, pop, createColorTable(), timeGrid, history);
  viewer.buildCounts();
  viewer.buildDiagram();
  viewer.buildHistory();
  viewer.wireControls();
  viewer.render(payload.time.start);
  await history.done;
  viewer.historyChart.refresh();
  viewer.historyChart.setCurrent(viewer.t);
  return viewer;
}

function fail(error: unknown): never {
  const el = document.getElementById('error');
  if (el) {
    el.hidden = false;
    el.textContent = `The viewer could not start: ${error instanceof Error ? error.message : String(error)}`;
  }
  throw error;
}

const started = start().catch(fail);
const need = (v: Viewer | undefined): Viewer => {
  if (!v) throw new Error('starclockViewer: not ready yet; await starclockViewer.ready');
  return v;
};
let viewer: Viewer | undefined;
started.then((v) => {
  viewer = v;
}, () => undefined);

window.starclockViewer = {
  ready: started.then(() => undefined),
  setTime(yr: number): void {
    const v = need(viewer);
    const lo = v.timeGrid.clock(v.timeGrid.from);
    const hi = v.timeGrid.clock(v.timeGrid.to);
    if (!(Number.isFinite(yr) && yr >= lo && yr <= hi)) {
      throw new RangeError(`setTime: time ${yr} yr outside the page's time span ${lo}–${hi} yr`);
    }
    v.render(v.timeGrid.fromClock(yr));
  },
  state: () => need(viewer).state(),
  play: () => need(viewer).setPlaying(true),
  pause: () => need(viewer).setPlaying(false),
  locate: (index: number) => need(viewer).locate(index),
  benchmark: (options?: BenchmarkOptions) => {
    const v = need(viewer);
    return runBenchmark(
      {
        frame: (t) => v.render(t),
        starsOnly: (t) => {
          v.pop.evaluate(t, v.counts);
          v.chart.drawStars(v.pop.columns, v.pop.n);
        },
        fillFixed: (xy, n) => v.chart.fillFixed(xy, n),
        size: () => v.chart.size(),
        n: v.pop.n,
        atFraction: (f) => v.timeGrid.atFraction(f),
        play: (on) => v.setPlaying(on),
        playing: () => v.playing,
      },
      options,
    );
  },
};
