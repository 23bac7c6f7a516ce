import { Button } from '@blueprintjs/core';
import { FlashIcon, MoonIcon } from '@blueprintjs/icons';
import { setTheme, useTheme } from './theme';

export function ThemeToggle() {
  const theme = useTheme();
  return theme === 'dark' ? (
    <Button variant="minimal" icon={<FlashIcon />} text="Light theme" onClick={() => setTheme('light')} />
  ) : (
    <Button variant="minimal" icon={<MoonIcon />} text="Dark theme" onClick={() => setTheme('dark')} />
  );
}
