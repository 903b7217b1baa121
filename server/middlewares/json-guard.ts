import type { RequestHandler } from 'express';
import { HttpError } from '../errors.ts';

/** Deeper than any real request: a page document at its own limit (40 nodes, two levels each: node, content) stays below it. */
export const MAX_JSON_DEPTH = 100;

// C0 controls but tab, newline and carriage return (a pasted Windows line end); DEL; C1 controls.
// PostgreSQL refuses NUL outright; the others have no business in a title, a name or a note.
const CONTROL = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f]/;

const fieldName = (path: Array<string | number>) => path.join('.') || 'body';

/**
 * Looks at a parsed JSON body before any schema or service does, without recursion (a body nested
 * 10,000 deep cannot overflow the stack here): refuses nesting deeper than MAX_JSON_DEPTH (400
 * `too_deep`) and any string, keys included, holding a control character other than tab and
 * newline (400 `control_character`, naming the field). Depth is checked first, before anything
 * measures or walks the body recursively.
 * @returns the problem, or undefined when the body is acceptable
 */
export function checkJsonBody(body: unknown): HttpError | undefined {
  const stack: Array<{ value: unknown; path: Array<string | number> }> = [{ value: body, path: [] }];
  for (let item = stack.pop(); item; item = stack.pop()) {
    const { value, path } = item;
    if (path.length > MAX_JSON_DEPTH) {
      const message = `The request is nested more than ${MAX_JSON_DEPTH} levels deep.`;
      return new HttpError(400, 'too_deep', message, { [fieldName(path.slice(0, 3))]: message });
    }
    if (typeof value === 'string') {
      if (CONTROL.test(value)) return controlCharacter(path);
    } else if (Array.isArray(value)) {
      for (let i = 0; i < value.length; i++) stack.push({ value: value[i], path: [...path, i] });
    } else if (value && typeof value === 'object') {
      for (const [key, child] of Object.entries(value)) {
        if (CONTROL.test(key)) return controlCharacter(path);
        stack.push({ value: child, path: [...path, key] });
      }
    }
  }
  return undefined;
}

function controlCharacter(path: Array<string | number>): HttpError {
  const field = fieldName(path);
  const message = 'Remove the invisible control character (only tab and new line are allowed in text).';
  return new HttpError(400, 'control_character', `${field}: ${message}`, { [field]: message });
}

/** Runs checkJsonBody on every JSON request body under /api. */
export const guardJsonBody: RequestHandler = (req, _res, next) => {
  if (req.body === undefined || req.body === null || typeof req.body !== 'object') return next();
  next(checkJsonBody(req.body));
};
