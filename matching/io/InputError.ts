import type { InputIssue } from '../../shared/inputIssue';

function issueText(i: InputIssue): string {
  return i.line !== undefined ? `line ${i.line}: ${i.message}` : i.field !== undefined ? `${i.field}: ${i.message}` : i.message;
}

/**
 * The one error every importer throws. It carries every problem found (not just the first), each
 * with its line and/or field, so a form or an HTTP 4xx answer can show them all; the message
 * lists up to five.
 */
export class InputError extends Error {
  readonly issues: InputIssue[];
  constructor(what: string, issues: InputIssue[]) {
    if (issues.length === 0) throw new RangeError('InputError needs at least one issue');
    const shown = issues.slice(0, 5).map(issueText).join('; ');
    const more = issues.length > 5 ? `; … and ${issues.length - 5} more` : '';
    super(issues.length === 1 ? `${what}: ${shown}` : `${what} has ${issues.length} problems: ${shown}${more}`);
    this.name = 'InputError';
    this.issues = issues;
  }
}
