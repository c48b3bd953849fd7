import { Badge, Callout, Code, Flex, Text } from '@radix-ui/themes';
import { ExclamationTriangleIcon } from '@radix-ui/react-icons';
import type { ApiProblem } from '@/lib/problem';

function problemCode(raw: unknown): string | null {
  if (typeof raw !== 'object' || raw === null) return null;
  const code = (raw as { code?: unknown }).code;
  return typeof code === 'string' ? code : null;
}

/** A refused request: the API's explanation, its finer code, and each offending field by JSON Pointer. */
export function ProblemAnswer({ status, problem, raw }: { status: number; problem: ApiProblem; raw: unknown }) {
  const code = problemCode(raw);
  return (
    <Callout.Root color="red" size="1" role="alert">
      <Callout.Icon>
        <ExclamationTriangleIcon />
      </Callout.Icon>
      <Flex direction="column" gap="2">
        <Flex gap="2" align="center" wrap="wrap">
          <Badge color="red" variant="solid" className="ll-num">
            {status}
          </Badge>
          <Text size="2" weight="medium">
            {problem.title}
          </Text>
          {code ? <Code variant="soft" color="red">{code}</Code> : null}
        </Flex>
        <Text size="2">{problem.detail}</Text>
        {problem.fieldErrors.length > 0 ? (
          <ul className="ll-field-problems">
            {problem.fieldErrors.map((field) => (
              <li key={`${field.pointer}:${field.detail}`}>
                <Code variant="ghost" size="1">{field.pointer}</Code> <Text size="1">{field.detail}</Text>
              </li>
            ))}
          </ul>
        ) : null}
        {problem.requestId ? (
          <Text size="1" color="gray">
            Request <span className="ll-num">{problem.requestId}</span>
          </Text>
        ) : null}
      </Flex>
    </Callout.Root>
  );
}
