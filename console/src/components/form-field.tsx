import { Flex, Text } from '@radix-ui/themes';
import type { ReactNode } from 'react';

export type FieldControlProps = {
  id: string;
  'aria-describedby': string | undefined;
  'aria-invalid': true | undefined;
};

type FormFieldProps = {
  id: string;
  label: string;
  hint?: ReactNode;
  /** The API's reason for refusing this field, shown right under it. */
  error?: string | undefined;
  children: (control: FieldControlProps) => ReactNode;
};

export function FormField({ id, label, hint, error, children }: FormFieldProps) {
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [errorId, hintId].filter(Boolean).join(' ') || undefined;

  return (
    <Flex direction="column" gap="1">
      <Text as="label" htmlFor={id} size="2" weight="medium">
        {label}
      </Text>
      {children({ id, 'aria-describedby': describedBy, 'aria-invalid': error ? true : undefined })}
      {error ? (
        <Text id={errorId} size="1" color="red" className="ll-field-error">
          {error}
        </Text>
      ) : null}
      {hint ? (
        <Text id={hintId} size="1" color="gray">
          {hint}
        </Text>
      ) : null}
    </Flex>
  );
}
