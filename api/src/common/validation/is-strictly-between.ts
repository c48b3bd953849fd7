import { ValidateBy, ValidationOptions } from 'class-validator';

/** An open interval check (class-validator's Min/Max are inclusive): lower < value < upper. */
export function IsStrictlyBetween(lower: number, upper: number, options?: ValidationOptions): PropertyDecorator {
  return ValidateBy(
    {
      name: 'isStrictlyBetween',
      constraints: [lower, upper],
      validator: {
        validate: (value: unknown) => typeof value === 'number' && value > lower && value < upper,
        defaultMessage: (args) => `${args?.property ?? 'value'} must be strictly between ${lower} and ${upper}`,
      },
    },
    options,
  );
}
