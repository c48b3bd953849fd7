import { ValidationError } from 'class-validator';
import { FieldProblem } from './problem.exception';

/** RFC 6901 escaping of one reference token. */
function escapePointerToken(token: string): string {
  return token.replace(/~/g, '~0').replace(/\//g, '~1');
}

/**
 * Flattens class-validator's tree into JSON Pointer field problems, e.g. `#/model/predictors/1`.
 * Whitelist violations ("property x should not exist") arrive as constraints on the unknown property.
 */
export function toFieldProblems(errors: ValidationError[], parent = '#'): FieldProblem[] {
  const problems: FieldProblem[] = [];
  for (const error of errors) {
    const pointer = `${parent}/${escapePointerToken(String(error.property))}`;
    for (const message of Object.values(error.constraints ?? {})) {
      // A validator of a whole array may point inside it: "@/1/power: reason" names element 1's field.
      const inner = /^@((?:\/[^/:]+)+): (.*)$/s.exec(message);
      problems.push(inner ? { pointer: `${pointer}${inner[1]}`, detail: inner[2]! } : { pointer, detail: message });
    }
    if (error.children && error.children.length > 0) {
      problems.push(...toFieldProblems(error.children, pointer));
    }
  }
  return problems;
}
