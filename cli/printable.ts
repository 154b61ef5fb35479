/**
 * User text (a case name, a custom gas's name, a message quoting a field) made safe to print on a terminal: control
 * characters — ANSI escape sequences above all, which could recolour, move the cursor or retitle the window — are
 * shown as escapes (\x1b, \n …) instead of being sent raw. Applied where text leaves the command line, not in the
 * engine, whose messages are plain data.
 */

// eslint-disable-next-line no-control-regex
const CONTROL = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f\u2028\u2029]/g;

/** Text with every control character but tab and newline written as a visible escape. */
export function printable(text: string): string {
  return text.replace(CONTROL, (ch) => {
    const code = ch.charCodeAt(0);
    if (ch === '\r') return '\\r';
    return code <= 0xff ? `\\x${code.toString(16).padStart(2, '0')}` : `\\u${code.toString(16).padStart(4, '0')}`;
  });
}

/** One line of user text: newlines and tabs escaped as well, so a name cannot start a line of its own. */
export function printableLine(text: string): string {
  return printable(text).replace(/\n/g, '\\n').replace(/\t/g, '\\t');
}
