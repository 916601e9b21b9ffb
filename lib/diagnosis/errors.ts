export type DiagnosisErrorCode =
  | "bad_number"
  | "bad_weight"
  | "bad_setting"
  | "bad_cost"
  | "bad_probability"
  | "bad_count"
  | "duplicate_id"
  | "unknown_node"
  | "unknown_option"
  | "option_node_mismatch"
  | "no_root"
  | "several_roots"
  | "unknown_assembly"
  | "cycle"
  | "no_hypotheses"
  | "all_ruled_out"
  | "empty_input";

/** The one error the engine throws; `code` is stable for callers, `message` is for people. */
export class DiagnosisError extends Error {
  readonly code: DiagnosisErrorCode;

  constructor(code: DiagnosisErrorCode, message: string) {
    super(message);
    this.name = "DiagnosisError";
    this.code = code;
  }
}
