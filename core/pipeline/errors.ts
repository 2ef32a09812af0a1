/** The data cannot be analysed at all (e.g. no isotherm left after exclusions). */
export class PipelineError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'PipelineError';
  }
}
