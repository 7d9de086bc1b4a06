import { svgNumber as n } from './svgNumber.js';

/** The moments marked on a track: arrival on the ZAMS, end of the main sequence, helium ignition, remnant birth. */
export type TrackEvent = 'zams' | 'tams' | 'he-ignition' | 'remnant-birth';

/** The marked moments in life order, with their legend wording. */
export const TRACK_EVENTS: readonly { event: TrackEvent; label: string }[] = [
  { event: 'zams', label: 'zero-age main sequence' },
  { event: 'tams', label: 'end of main sequence' },
  { event: 'he-ignition', label: 'helium ignition' },
  { event: 'remnant-birth', label: 'remnant birth' },
];

/**
 * The mark of one event at (x, y) px, a shape per event so the marks read without colour:
 * circle (ZAMS), square (end of main sequence), triangle (helium ignition), diamond (remnant
 * birth); white inside, outlined in `color`. Circles are `<circle>`, the others `<rect>` or
 * `<polygon>` — never `<path>`, which the figures keep for lines.
 *
 * @param event which moment
 * @param x px
 * @param y px
 * @param color outline, '#rrggbb'
 */
export function eventMark(event: TrackEvent, x: number, y: number, color: string): string {
  const common = `class="event event-${event}" fill="#ffffff" stroke="${color}" stroke-width="1.3"`;
  const s = 3.4;
  switch (event) {
    case 'zams':
      return `<circle ${common} cx="${n(x)}" cy="${n(y)}" r="${s}"/>`;
    case 'tams':
      return `<rect ${common} x="${n(x - s + 0.4)}" y="${n(y - s + 0.4)}" width="${n(2 * s - 0.8)}" height="${n(2 * s - 0.8)}"/>`;
    case 'he-ignition':
      return `<polygon ${common} points="${n(x)},${n(y - s - 0.8)} ${n(x + s + 0.4)},${n(y + s - 0.4)} ${n(x - s - 0.4)},${n(y + s - 0.4)}"/>`;
    case 'remnant-birth':
      return `<polygon ${common} points="${n(x)},${n(y - s - 0.8)} ${n(x + s + 0.8)},${n(y)} ${n(x)},${n(y + s + 0.8)} ${n(x - s - 0.8)},${n(y)}"/>`;
  }
}
