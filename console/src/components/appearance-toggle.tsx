import { MoonIcon, SunIcon } from '@radix-ui/react-icons';
import { IconButton, Tooltip } from '@radix-ui/themes';
import { useAppearance } from '@/components/appearance';

export function AppearanceToggle() {
  const { appearance, toggleAppearance } = useAppearance();
  const label = appearance === 'dark' ? 'Switch to light theme' : 'Switch to dark theme';

  return (
    <Tooltip content={label}>
      <IconButton variant="ghost" color="gray" size="2" onClick={toggleAppearance} aria-label={label}>
        {appearance === 'dark' ? <SunIcon /> : <MoonIcon />}
      </IconButton>
    </Tooltip>
  );
}
