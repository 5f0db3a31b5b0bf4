// PostgreSQL text and jsonb cannot hold U+0000: a body or query string carrying it would fail deep in
// a query as a 500. It is refused here instead, naming each field as the schemas do ("conditions.0.text").
import type { RequestHandler } from 'express';
import { HttpError } from './errors';

const mostNamed = 20;

// Walks without recursion, so a body nested thousands deep cannot exhaust the stack.
function fieldsWithNul(root: unknown): string[] {
  const found: string[] = [];
  const pending: [unknown, string[]][] = [[root, []]];
  while (pending.length && found.length < mostNamed) {
    const [value, path] = pending.pop()!;
    if (typeof value === 'string') {
      if (value.includes('\u0000')) found.push(path.join('.') || '_');
    } else if (value && typeof value === 'object') {
      for (const [key, inner] of Object.entries(value)) {
        if (key.includes('\u0000')) found.push([...path, key].join('.'));
        else pending.push([inner, [...path, key]]);
      }
    }
  }
  return found;
}

export const refuseNulCharacters: RequestHandler = (req, _res, next) => {
  const found = [...fieldsWithNul(req.body), ...fieldsWithNul(req.query)];
  if (found.length === 0) return next();
  const why = 'This contains an invisible NUL character (U+0000), which cannot be stored; remove it.';
  next(new HttpError(400, 'invalid_input', 'Some text holds a character that cannot be stored; see the fields named.', Object.fromEntries(found.map((f) => [f, why]))));
};
