import { ArrowRightIcon } from '@radix-ui/react-icons';
import { Card, Flex, Heading, Text } from '@radix-ui/themes';
import { Link as RouterLink } from 'react-router-dom';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import '@/features/overview/components/overview-page.css';

const firstSteps = [
  {
    to: paths.apiKeys,
    title: 'Create an API key',
    text: 'Give a service its own key so its calls are metered and can be revoked on their own.',
  },
  {
    to: paths.datasets,
    title: 'Add a dataset',
    text: 'Store observations once and refer to them from any number of fits.',
  },
  {
    to: paths.playground,
    title: 'Try a fit',
    text: 'Write a request in the playground and read the estimates it returns.',
  },
] as const;

export function OverviewPage() {
  return (
    <>
      <PageHeader title="Overview" description="Your team's fits, keys and consumption at a glance." />

      <Card size="3" className="ll-panel">
        <EmptyState
          title="No activity yet"
          description="Once your team has sent its first requests, recent fits and this month's consumption are summarised here."
        />
      </Card>

      <section aria-labelledby="first-steps-heading" className="ll-section">
        <Heading as="h2" size="4" weight="medium" id="first-steps-heading" mb="3">
          First steps
        </Heading>
        <ol className="ll-steps">
          {firstSteps.map((step, index) => (
            <li key={step.to}>
              <Card asChild size="2" className="ll-step-card">
                <RouterLink to={step.to}>
                  <Flex direction="column" gap="2">
                    <Text size="1" className="ll-step-number" aria-hidden="true">
                      {String(index + 1).padStart(2, '0')}
                    </Text>
                    <Flex align="center" justify="between" gap="2">
                      <Text size="3" weight="medium">
                        {step.title}
                      </Text>
                      <ArrowRightIcon aria-hidden="true" />
                    </Flex>
                    <Text size="2" color="gray">
                      {step.text}
                    </Text>
                  </Flex>
                </RouterLink>
              </Card>
            </li>
          ))}
        </ol>
      </section>
    </>
  );
}
