import uPlot from 'uplot';
import { PHASES } from '../../lib/model/phases.js';
import type { Population } from './population.js';
import { COUNT_SLOTS } from './population.js';
import { allocateStateColumns } from '../../lib/interp/gridQuery.js';
import { PHASE_COLORS } from './phaseStyle.js';
import type { TimeGrid } from './timeGrid.js';

/** Counts per phase at every grid time, filled in chunks so the page stays responsive. */
export interface History {
  times: Float64Array;
  /** [phase][time index]; null where the count is 0 (a log axis has no 0) */
  counts: (number | null)[][];
  done: Promise<void>;
}

/** Most star evaluations per chunk of work between paints. */
const CHUNK_EVALUATIONS = 200_000;

/**
 * Computes the counts per phase at each time of the grid with the same evaluation as the
 * frames (Population.evaluate), in chunks between animation frames; `onProgress` gets the number
 * of times done.
 */
export function computeHistory(pop: Population, timeGrid: TimeGrid, onProgress: (done: number) => void): History {
  const times = timeGrid.times;
  const steps = times.length;
  const counts: (number | null)[][] = PHASES.map(() => new Array<number | null>(steps).fill(null));
  const scratch = new Int32Array(COUNT_SLOTS);
  const columns = allocateStateColumns(pop.n);
  const perChunk = Math.max(1, Math.floor(CHUNK_EVALUATIONS / pop.n));
  let i = 0;
  const done = new Promise<void>((resolve, reject) => {
    const work = () => {
      try {
        const stop = Math.min(steps, i + perChunk);
        for (; i < stop; i++) {
          pop.evaluate(times[i], scratch, columns);
          for (let p = 0; p < PHASES.length; p++) counts[p][i] = scratch[p] > 0 ? scratch[p] : null;
        }
        onProgress(i);
        if (i < steps) setTimeout(work, 0);
        else resolve();
      } catch (error) {
        reject(error);
      }
    };
    setTimeout(work, 0);
  });
  return { times, counts, done };
}

/** The second chart: counts per phase over the whole time span, with a cursor at the current time. */
export interface HistoryChart {
  plot: uPlot;
  setCurrent(t: number): void;
  refresh(): void;
}

export function createHistoryChart(el: HTMLElement, history: History, timeGrid: TimeGrid, log: boolean, width: number): HistoryChart {
  let current = timeGrid.from;
  const axisStroke = '#a8aec4';
  const gridStroke = 'rgba(255,255,255,0.07)';
  const series: uPlot.Series[] = [
    { label: 'time', value: (_u, v) => (v == null ? '—' : timeGrid.label(v)) },
    ...PHASES.map((p) => ({ label: p, stroke: PHASE_COLORS[p], width: 1.5, spanGaps: false, points: { show: false } })),
  ];
  const opts: uPlot.Options = {
    width,
    height: 230,
    scales: {
      x: { time: false, distr: log ? 3 : 1, auto: false, range: [timeGrid.from, timeGrid.to] },
      y: { distr: 3, auto: true },
    },
    axes: [
      { stroke: axisStroke, grid: { stroke: gridStroke }, ticks: { stroke: gridStroke }, values: (_u, vals) => vals.map((v) => (v == null ? '' : timeGrid.label(v))), label: 'time', space: 70 },
      { stroke: axisStroke, grid: { stroke: gridStroke }, ticks: { stroke: gridStroke }, label: 'stars', size: 60 },
    ],
    series,
    legend: { show: true, live: true },
    cursor: { drag: { x: false, y: false }, points: { show: false } },
  };
  const data = [Array.from(history.times), ...history.counts] as uPlot.AlignedData;
  const plot = new uPlot(opts, data, el);
  // the current time: a line element moved over the chart (no redraw of the chart per frame)
  const cursor = document.createElement('div');
  cursor.className = 'time-cursor';
  plot.over.appendChild(cursor);
  const place = () => {
    cursor.style.transform = `translateX(${plot.valToPos(current, 'x')}px)`;
  };
  plot.hooks.setSize = [...(plot.hooks.setSize ?? []), () => queueMicrotask(place)];
  return {
    plot,
    setCurrent(t: number) {
      current = t;
      place();
    },
    refresh() {
      plot.setData([Array.from(history.times), ...history.counts] as uPlot.AlignedData);
      place();
    },
  };
}
