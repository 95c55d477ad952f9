import type { Delimiter, FieldSelector } from './lineFormat.ts';

/** The cells of a delimited line; runs of spaces count as one delimiter. */
export function splitColumns(text: string, delimiter: Delimiter): string[] {
  const trimmed = text.trim();
  if (trimmed === '') return [];
  return delimiter === ' ' ? trimmed.split(/\s+/) : trimmed.split(delimiter).map((cell) => cell.trim());
}

// A name is a word before '=' or ':'; a number never starts one, so `12:30:05` is no pair.
const namePattern = /([A-Za-z_][\w.[\]-]*)\s*[=:]/g;

/** The `name=value` and `name: value` pairs of a line, in order; values keep a unit suffix. */
export function namedValues(text: string): { name: string; value: string }[] {
  const found = [...text.matchAll(namePattern)];
  return found.map((match, i) => {
    const start = match.index + match[0].length;
    const end = found[i + 1]?.index ?? text.length;
    return { name: match[1]!, value: text.slice(start, end).replace(/^[\s,;]+|[\s,;]+$/g, '') };
  });
}

/** The text of the selected field, or undefined when the line has no such field. */
export function selectField(text: string, field: FieldSelector): string | undefined {
  if (field.kind === 'bare') return text.trim();
  if (field.kind === 'column') return splitColumns(text, field.delimiter)[field.index];
  const wanted = field.name.toLowerCase();
  return namedValues(text).find((pair) => pair.name.toLowerCase() === wanted)?.value;
}
