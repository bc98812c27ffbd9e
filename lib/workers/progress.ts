/**
 * Progress of a long computation, as a task reports it and a client sees it. Pure: used inside
 * worker threads (lib/workers/entry.ts), in-process (inline mode) and by the job registry.
 */

/** How far a task has got: `done` of `total` units of work, and what it is doing now. */
export interface Progress {
  /** Units of work finished, integer, 0 ≤ done ≤ total; never decreases within one run. */
  done: number;
  /** Units of work in the run, integer ≥ 0 (0 = not known yet). */
  total: number;
  /** What the task is doing, short human-readable text (≤ 120 characters). */
  stage: string;
}

/** A task's progress callback. Throws RangeError for a malformed or backwards report. */
export type ReportProgress = (progress: Readonly<Progress>) => void;

/** The progress of a run that has not reported anything yet. */
export const NO_PROGRESS: Readonly<Progress> = Object.freeze({ done: 0, total: 0, stage: "waiting" });

const MAX_STAGE_LENGTH = 120;

/**
 * Checks one report: integers, 0 ≤ done ≤ total, a non-empty stage of at most 120 characters.
 * A bad report is a programmer error in the task, so it throws RangeError (the run then fails
 * with that message instead of showing nonsense to the client).
 */
export function checkProgress(progress: Readonly<Progress>): Progress {
  const { done, total, stage } = progress;
  if (!Number.isSafeInteger(total) || total < 0) throw new RangeError(`progress.total must be an integer ≥ 0, got ${String(total)}`);
  if (!Number.isSafeInteger(done) || done < 0 || done > total) {
    throw new RangeError(`progress.done must be an integer in [0, total = ${total}], got ${String(done)}`);
  }
  if (typeof stage !== "string" || stage.trim() === "" || stage.length > MAX_STAGE_LENGTH) {
    throw new RangeError(`progress.stage must be non-empty text of at most ${MAX_STAGE_LENGTH} characters`);
  }
  return { done, total, stage };
}

/** Share of the work done, 0…1 (0 while the total is unknown). */
export function progressFraction(progress: Readonly<Progress>): number {
  return progress.total > 0 ? progress.done / progress.total : 0;
}

export interface ProgressReporterOptions {
  /**
   * Least time between two posted reports, ms (default 50). Reports in between are merged:
   * the newest one is kept and posted when the interval has passed, on a stage change, when the
   * work is complete, or on `flush()`.
   */
  minIntervalMs?: number;
  /** Clock, ms (default `performance.now`); injectable for tests. */
  now?: () => number;
}

export interface ProgressReporter {
  /** The callback handed to the task. */
  report: ReportProgress;
  /** Posts the newest report if it was held back by the interval. */
  flush: () => void;
}

/**
 * Wraps `post` (e.g. a worker's `postMessage`) as a task's progress callback: checks each report
 * ({@link checkProgress}), refuses a `done` smaller than the previous one (RangeError), and
 * throttles so a tight loop reporting every iteration costs a message at most every
 * `minIntervalMs`. The first report, a new stage and completion (done = total > 0) are posted
 * at once, so the client never misses a stage or the end.
 */
export function createProgressReporter(post: (progress: Progress) => void, options: ProgressReporterOptions = {}): ProgressReporter {
  const minIntervalMs = options.minIntervalMs ?? 50;
  const now = options.now ?? (() => performance.now());
  let lastDone = -1;
  let lastPosted: Progress | null = null;
  let lastPostedAt = -Infinity;
  let held: Progress | null = null;

  const send = (progress: Progress) => {
    held = null;
    lastPosted = progress;
    lastPostedAt = now();
    post(progress);
  };

  return {
    report(progress) {
      const checked = checkProgress(progress);
      if (checked.done < lastDone) throw new RangeError(`progress went backwards: done ${checked.done} after ${lastDone}`);
      lastDone = checked.done;
      const urgent =
        lastPosted === null || checked.stage !== lastPosted.stage || (checked.total > 0 && checked.done === checked.total);
      if (urgent || now() - lastPostedAt >= minIntervalMs) send(checked);
      else held = checked;
    },
    flush() {
      if (held) send(held);
    },
  };
}
