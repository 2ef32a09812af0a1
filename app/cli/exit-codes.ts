/** Documented exit codes of the `thermoshift` command (README, "Command line"). */
export const EXIT = {
  /** Everything worked (warnings may have been printed). */
  ok: 0,
  /** The data could not be read or analysed (bad file, unknown unit, nothing to shift …). */
  dataError: 1,
  /** The command line itself was wrong (unknown option, missing argument). */
  usage: 2,
  /** An output file exists and --force was not given, or it could not be written. */
  outputError: 3,
  /** A batch finished, but at least one sample failed. */
  batchPartialFailure: 4,
  /** compare --spec: at least one sample failed a criterion (the comparison itself worked). */
  specFailed: 5,
  /** compare --spec: no sample failed, but at least one criterion was inconclusive. */
  specInconclusive: 6,
  /** A bug in Thermoshift: please report it with --debug output. */
  internal: 70,
} as const;
