/** A parse error shown in place: the message, and the offending line with the spot marked. */
import type { InputError } from '../../../core/types.ts';
import { locate } from './entryText.ts';

/** Characters of context kept on each side of the error in a long line. */
const CONTEXT = 36;
/** The parser ends its messages with a 1-based "at column N"; the page shows the column itself, beside the marked text. */
const COLUMN_SUFFIX = / at column \d+$/;

export function ParseErrorView({ id, text, error }: { id: string; text: string; error: InputError }) {
  const { line, lineText, column } = locate(text, error.position ?? 0);
  const from = Math.max(0, column - CONTEXT);
  const to = Math.min(lineText.length, column + CONTEXT);
  const lead = from > 0 ? '…' : '';
  const before = lead + lineText.slice(from, column);
  const at = lineText.slice(column, column + 1);
  const after = lineText.slice(column + 1, to) + (to < lineText.length ? '…' : '');
  const multiLine = text.includes('\n');
  const message = error.message.replace(COLUMN_SUFFIX, '');
  // The message usually names what was expected already; repeat it only when it does not.
  const bare = (t: string) => t.replace(/['"]/g, '');
  const expected =
    error.expected && !bare(message).includes(bare(error.expected)) ? ` — expected ${error.expected}` : '';
  return (
    <div id={id} className="pw-parse-error" role="alert">
      <p className="pw-parse-message">{message}</p>
      <pre className="pw-parse-line" aria-label={`Error at line ${line}, column ${column + 1}`}>
        <span>{before}</span>
        <mark data-testid="parse-error-mark">{at || ' '}</mark>
        <span>{after}</span>
        {'\n'}
        <span aria-hidden="true">{' '.repeat(before.length)}^</span>
      </pre>
      <p className="pw-parse-where">
        {multiLine ? `Line ${line}, column ${column + 1}` : `Column ${column + 1}`}
        {expected}
      </p>
    </div>
  );
}
