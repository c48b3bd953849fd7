import { ArrowRightIcon } from '@radix-ui/react-icons';
import { Badge, Card, Flex, Heading, Text } from '@radix-ui/themes';
import { Link as RouterLink } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { teamPath, type TeamSection } from '@/config/paths';
import { useCurrentTeam } from '@/lib/current-team';
import { roleAllows, roleLabels, roleSummaries, type TeamPermission } from '@/lib/permissions';
import { UsageSummary } from '@/features/overview/components/usage-summary';
import '@/features/overview/components/overview-page.css';

type QuickLink = { section: TeamSection; permission: TeamPermission; title: string; text: string; hash?: string };

const quickLinks: QuickLink[] = [
  {
    section: 'apiKeys',
    permission: 'keys:manage-own',
    title: 'API keys',
    text: 'Give each service its own key, so its calls are metered and it can be revoked on its own.',
  },
  {
    section: 'playground',
    permission: 'playground:use',
    title: 'Try a fit',
    text: 'Write a request in the playground and read the estimates it returns.',
  },
  {
    section: 'datasets',
    permission: 'datasets:read',
    title: 'Datasets',
    text: 'Store observations once and refer to them from any number of fits.',
  },
  {
    section: 'members',
    permission: 'invitations:manage',
    title: 'Invite a teammate',
    text: 'Send an invitation by e-mail with the role the person needs.',
  },
  {
    section: 'members',
    permission: 'audit:read',
    title: 'Audit log',
    text: 'Who signed in, changed roles or touched keys, and from where.',
    hash: 'audit-log',
  },
  {
    section: 'usage',
    permission: 'usage:read',
    title: 'Usage',
    text: "Requests and fitted observations against the plan's allowance.",
  },
  {
    section: 'members',
    permission: 'members:read',
    title: 'Members',
    text: 'Who belongs to the team and which role each person holds.',
  },
];

const planLabels = { starter: 'Starter', growth: 'Growth', scale: 'Scale' } as const;

export function OverviewPage() {
  const { team } = useCurrentTeam();
  const links = quickLinks.filter((link) => roleAllows(team.yourRole, link.permission)).slice(0, 4);

  return (
    <>
      <PageHeader
        title="Overview"
        description="Your team at a glance."
        badge={
          team.isDemo ? (
            <Badge color="amber" variant="soft" radius="full">
              Invented demo team
            </Badge>
          ) : undefined
        }
      />

      <div className="ll-overview-grid">
        <Card size="3" className="ll-panel">
          <Flex direction="column" gap="4">
            <Heading as="h2" size="3" weight="medium">
              Team
            </Heading>
            <dl className="ll-facts">
              <div>
                <dt>Name</dt>
                <dd>{team.name}</dd>
              </div>
              <div>
                <dt>Plan</dt>
                <dd>{planLabels[team.plan]}</dd>
              </div>
              <div>
                <dt>Your role</dt>
                <dd>
                  <Flex direction="column" gap="1" align="start">
                    <Badge variant="soft" size="2">
                      {roleLabels[team.yourRole]}
                    </Badge>
                    <Text size="2" color="gray">
                      {roleSummaries[team.yourRole]}
                    </Text>
                  </Flex>
                </dd>
              </div>
              <div>
                <dt>Developers&rsquo; own keys</dt>
                <dd>{team.developerKeysAllowed ? 'Allowed' : 'Not allowed'}</dd>
              </div>
            </dl>
          </Flex>
        </Card>

        <UsageSummary />
      </div>

      <section aria-labelledby="quick-links-heading" className="ll-section">
        <Heading as="h2" size="4" weight="medium" id="quick-links-heading" mb="3">
          Go to
        </Heading>
        <ul className="ll-steps">
          {links.map((link) => (
            <li key={`${link.section}-${link.title}`}>
              <Card asChild size="2" className="ll-step-card">
                <RouterLink to={`${teamPath(team.id, link.section)}${link.hash ? `#${link.hash}` : ''}`}>
                  <Flex direction="column" gap="2">
                    <Flex align="center" justify="between" gap="2">
                      <Text size="3" weight="medium">
                        {link.title}
                      </Text>
                      <ArrowRightIcon aria-hidden="true" />
                    </Flex>
                    <Text size="2" color="gray">
                      {link.text}
                    </Text>
                  </Flex>
                </RouterLink>
              </Card>
            </li>
          ))}
        </ul>
      </section>
    </>
  );
}
