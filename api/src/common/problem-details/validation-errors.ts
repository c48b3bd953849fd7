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
      problems.push({ pointer, detail: message });
    }
    if (error.children && error.children.length > 0) {
      problems.push(...toFieldProblems(error.children, pointer));
    }
  }
  return problems;
}
