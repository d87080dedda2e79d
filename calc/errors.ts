/** One problem with an input, named by its field path (e.g. "surfaces.3.grossAreaFt2"). */
export interface InputIssue {
  path: string;
  message: string;
}

/** Thrown when an input cannot be calculated; never a NaN, never a silent clamp. */
export class CalcInputError extends Error {
  readonly issues: InputIssue[];
  constructor(issues: InputIssue[]) {
    super(issues.map((i) => `${i.path}: ${i.message}`).join("; "));
    this.name = "CalcInputError";
    this.issues = issues;
  }
  static at(path: string, message: string): CalcInputError {
    return new CalcInputError([{ path, message }]);
  }
}
