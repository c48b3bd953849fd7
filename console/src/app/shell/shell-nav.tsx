import { Text } from '@radix-ui/themes';
import { NavLink } from 'react-router-dom';
import { navGroupsFor } from '@/app/shell/nav-items';
import { teamPath } from '@/config/paths';
import { useCurrentTeam } from '@/lib/current-team';

export function ShellNav() {
  const { team } = useCurrentTeam();
  return (
    <nav aria-label="Main" className="ll-nav">
      {navGroupsFor(team.yourRole).map((group, groupIndex) => {
        const headingId = group.label ? `nav-group-${groupIndex}` : undefined;
        return (
          <div key={group.label ?? groupIndex} className="ll-nav-group">
            {group.label ? (
              <Text as="div" size="1" weight="medium" className="ll-nav-group-label" id={headingId}>
                {group.label}
              </Text>
            ) : null}
            <ul className="ll-nav-list" aria-labelledby={headingId}>
              {group.items.map((item) => {
                const Icon = item.icon;
                return (
                  <li key={item.section}>
                    <NavLink to={teamPath(team.id, item.section)} end={item.section === 'overview'} className="ll-nav-link">
                      <Icon aria-hidden />
                      <span className="ll-nav-label">{item.label}</span>
                      {item.soon ? (
                        <>
                          <span className="ll-nav-soon" aria-hidden="true">
                            soon
                          </span>
                          <span className="ll-visually-hidden">, coming soon</span>
                        </>
                      ) : null}
                    </NavLink>
                  </li>
                );
              })}
            </ul>
          </div>
        );
      })}
    </nav>
  );
}
