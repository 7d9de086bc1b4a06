/** Where a byte scan stands between calls: the quoting state and the last record end found. */
export interface RecordCutter {
  /**
   * Scans `bytes[from..]` (continuing from the state the previous call on the same growing
   * buffer left) and returns the offset just after the last record terminator (`\n`) found
   * in `bytes` so far, or 0 if none. After the caller cuts the buffer at offset `k`, it calls
   * `shift(k)` so that positions stay aligned.
   */
  scan(bytes: Uint8Array, from: number): number;
  /** The caller removed the first `k` bytes of its buffer. */
  shift(k: number): void;
  /** True while the scan stands inside a quoted field (an unterminated quote at end of input). */
  readonly inQuotes: boolean;
}

// Quoting states, the same machine as nextCsvRecord so that both agree on where records end.
const FIELD_START = 0;
const UNQUOTED = 1;
const QUOTED = 2;
const QUOTE_SEEN = 3;
const LF = 10;
const COMMA = 44;
const QUOTE = 34;

/**
 * A cutter that finds record boundaries in UTF-8 bytes without decoding them, so the
 * input can be cut into blocks that each hold whole records (RFC 4180, Shafranovich 2005:
 * a `"` at the start of a field opens a quoted field in which commas and line breaks are
 * data and `""` is a quote). In `lineMode` every LF ends a record, quoted or not — the
 * contract of a line-oriented stream (and of NDJSON, whose strings cannot hold a raw LF).
 * Bytes without any `"` take a fast path (`lastIndexOf`).
 *
 * @param lineMode true: every LF ends a record
 * @example
 * const cut = createRecordCutter(false);
 * cut.scan(new TextEncoder().encode('a,"x\ny"\nb'), 0) // 8 (after the second LF)
 */
export function createRecordCutter(lineMode: boolean): RecordCutter {
  let state = FIELD_START;
  let lastEnd = 0;
  return {
    get inQuotes() {
      return state === QUOTED;
    },
    shift(k: number) {
      lastEnd = lastEnd > k ? lastEnd - k : 0;
    },
    scan(bytes: Uint8Array, from: number): number {
      const n = bytes.length;
      if (from >= n) return lastEnd;
      if (lineMode || (state !== QUOTED && state !== QUOTE_SEEN && bytes.indexOf(QUOTE, from) < 0)) {
        const nl = bytes.lastIndexOf(LF);
        if (nl >= from) lastEnd = nl + 1;
        const last = bytes[n - 1];
        if (!lineMode) state = last === LF || last === COMMA ? FIELD_START : UNQUOTED;
        return lastEnd;
      }
      let s = state;
      for (let i = from; i < n; i++) {
        const c = bytes[i];
        switch (s) {
          case FIELD_START:
            if (c === QUOTE) s = QUOTED;
            else if (c === LF) lastEnd = i + 1;
            else if (c !== COMMA) s = UNQUOTED;
            break;
          case UNQUOTED:
            if (c === COMMA) s = FIELD_START;
            else if (c === LF) {
              s = FIELD_START;
              lastEnd = i + 1;
            }
            break;
          case QUOTED:
            if (c === QUOTE) s = QUOTE_SEEN;
            break;
          default: // QUOTE_SEEN
            if (c === QUOTE) s = QUOTED;
            else if (c === COMMA) s = FIELD_START;
            else if (c === LF) {
              s = FIELD_START;
              lastEnd = i + 1;
            } else s = UNQUOTED;
        }
      }
      state = s;
      return lastEnd;
    },
  };
}
