import { formatCount, type RouteProblem, routeError } from "./problems";

/** Collects problems up to a cap, counting (not storing) the rest. */
export class ProblemList {
  readonly items: RouteProblem[] = [];
  private omitted = 0;
  private errorCount = 0;

  constructor(private readonly max: number) {}

  add(problem: RouteProblem): void {
    if (problem.severity === "error") this.errorCount += 1;
    if (this.items.length < this.max) this.items.push(problem);
    else this.omitted += 1;
  }

  get hasErrors(): boolean {
    return this.errorCount > 0;
  }

  /** The stored problems, plus one closing entry when some were left out. */
  list(): RouteProblem[] {
    if (this.omitted === 0) return [...this.items];
    return [
      ...this.items,
      routeError(
        "too-many-problems",
        `…and ${formatCount(this.omitted)} more problems not listed. Fix the ones above and try again.`,
      ),
    ];
  }
}
