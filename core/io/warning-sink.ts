import type { DataWarning } from '../data/types';

/** Collects warnings for one file, listing at most `max` and counting the rest. */
export class WarningSink {
  readonly list: DataWarning[] = [];
  private overflow = 0;

  constructor(
    readonly file: string,
    private readonly max: number,
  ) {}

  add(row: number, column: number, message: string): void {
    if (this.list.length < this.max) this.list.push({ file: this.file, row, column, message });
    else this.overflow++;
  }

  /** Counts problems that were not listed one by one. */
  addUnlisted(count: number): void {
    this.overflow += count;
  }

  /** The warnings, with a closing summary when some were not listed. */
  finish(): DataWarning[] {
    if (this.overflow > 0) {
      this.list.push({
        file: this.file,
        row: 0,
        column: 0,
        message: `${this.overflow} more problem rows in this file were skipped but not listed one by one`,
      });
    }
    return this.list;
  }
}
