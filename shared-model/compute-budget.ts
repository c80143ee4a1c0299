/**
 * Iteration and wall-time budgets of a long computation (a line-scan fit, an energy). A computation that
 * would run past either stops with a message saying what it was doing, how far it got and what to change,
 * instead of holding a core (or, before it ran in a worker, the host) for minutes.
 */
import { DomainError } from './api/result';

export interface ComputeBudget {
  /** Most iterations, counted in the computation's own unit (model evaluations, pair terms, …). */
  maxIterations: number;
  /** Most wall-clock time, ms. */
  maxWallMs: number;
}

/** What the meter says when a budget is spent. */
export interface BudgetLabels {
  /** The computation, e.g. "the line-scan fit". */
  what: string;
  /** The iteration unit, plural, e.g. "model evaluations". */
  unit: string;
  /** What the user can change, e.g. "bin the scan to fewer points". */
  advice: string;
  /** The input field at fault, when there is one. */
  field?: string;
}

/** Thrown when a computation spends its budget; dispatch answers it as `unsupported` with the message. */
export class BudgetExceeded extends DomainError {
  constructor(
    message: string,
    field: string | undefined,
    readonly spent: { iterations: number; elapsedMs: number },
  ) {
    super('unsupported', message, field);
    this.name = 'BudgetExceeded';
  }
}

/** A clock in ms; Date.now is ES2022 and runs in every layer (main thread, worker, renderer). */
export type Clock = () => number;

export class BudgetMeter {
  private iterations = 0;
  private readonly startedMs: number;
  /** What the computation is at, for the message (e.g. "model A@B"). */
  stage = '';

  constructor(
    readonly budget: ComputeBudget,
    readonly labels: BudgetLabels,
    private readonly clock: Clock = Date.now,
  ) {
    if (!(budget.maxIterations > 0) || !(budget.maxWallMs > 0))
      throw new RangeError(`a compute budget needs positive limits, got ${JSON.stringify(budget)}`);
    this.startedMs = clock();
  }

  get spentIterations(): number {
    return this.iterations;
  }

  elapsedMs(): number {
    return this.clock() - this.startedMs;
  }

  /** Counts `n` more iterations and checks both budgets. */
  spend(n = 1): void {
    this.iterations += n;
    this.check();
  }

  /** Sets the iteration count to `total` (for loops that know their running total) and checks both budgets. */
  reach(total: number): void {
    this.iterations = total;
    this.check();
  }

  /** Throws BudgetExceeded when either budget is spent. */
  check(): void {
    const elapsed = this.elapsedMs();
    const { maxIterations, maxWallMs } = this.budget;
    const at = this.stage ? ` at ${this.stage}` : '';
    const count = `${this.iterations.toLocaleString('en-GB')} ${this.labels.unit}`;
    if (this.iterations > maxIterations) {
      throw new BudgetExceeded(
        `${this.labels.what} stopped${at}: it needed more than its budget of ` +
          `${maxIterations.toLocaleString('en-GB')} ${this.labels.unit} (${formatMs(elapsed)} so far); ${this.labels.advice}`,
        this.labels.field,
        { iterations: this.iterations, elapsedMs: elapsed },
      );
    }
    if (elapsed > maxWallMs) {
      throw new BudgetExceeded(
        `${this.labels.what} stopped${at}: it ran past its time budget of ${formatMs(maxWallMs)} ` +
          `(${count} done); ${this.labels.advice}`,
        this.labels.field,
        { iterations: this.iterations, elapsedMs: elapsed },
      );
    }
  }
}

function formatMs(ms: number): string {
  return ms >= 1000 ? `${(ms / 1000).toFixed(1)} s` : `${Math.round(ms)} ms`;
}
