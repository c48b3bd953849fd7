import { ExclamationTriangleIcon } from '@radix-ui/react-icons';
import { Callout, Text } from '@radix-ui/themes';
import { ApiProblem } from '@/lib/problem';

type ProblemCalloutProps = {
  error: unknown;
  /** Shown when the failure is not an answer from the API (e.g. the network dropped). */
  fallback?: string;
};

// A refused request, in the API's own words: its `detail`, plus the request id for support.
export function ProblemCallout({ error, fallback = 'The request could not be sent. Check your connection and try again.' }: ProblemCalloutProps) {
  if (error === null || error === undefined) return null;
  const problem = error instanceof ApiProblem ? error : null;
  return (
    <Callout.Root color="red" size="1" role="alert" className="ll-problem">
      <Callout.Icon>
        <ExclamationTriangleIcon />
      </Callout.Icon>
      <Callout.Text>
        {problem ? problem.detail : fallback}
        {problem?.requestId ? (
          <Text as="span" size="1" color="gray" className="ll-problem-request">
            {' '}
            Request <span className="ll-num">{problem.requestId}</span>
          </Text>
        ) : null}
      </Callout.Text>
    </Callout.Root>
  );
}
