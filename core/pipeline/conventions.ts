/**
 * The conventions as printed in CSV headers; their wording is core/data/conventions.ts.
 */
import { CONVENTIONS } from '../data/conventions';

export { CONVENTIONS };

/** The conventions as comment lines for CSV headers (each line starts with "# "). */
export function conventionCommentLines(): string[] {
  return [
    `# convention (horizontal): ${CONVENTIONS.horizontal}`,
    `# convention (vertical): ${CONVENTIONS.vertical}`,
    `# logarithms: ${CONVENTIONS.logarithms}`,
  ];
}
