/** A plain number (what a spreadsheet would show anyway), never a formula. */
const PLAIN_NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/**
 * Makes a cell safe to open in a spreadsheet: text starting with =, +, -, @ (or a tab or carriage
 * return, which some programs skip before reading a formula) gets a leading apostrophe so it is
 * shown, not run (OWASP, "CSV Injection"). Plain numbers such as −1.46 are left as they are.
 * @param value the cell's content
 * @returns the content to write
 */
export function safeCell(value: string | number | boolean | null | undefined): string {
  if (value === null || value === undefined) return '';
  const text = String(value);
  if (PLAIN_NUMBER.test(text)) return text;
  return /^[=+\-@\t\r\u2212]/.test(text) ? `'${text}` : text;
}
