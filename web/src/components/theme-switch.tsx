import { useTheme, type ThemeChoice } from '../lib/theme.js';

export function ThemeSwitch() {
  const [choice, setChoice] = useTheme();
  return (
    <label className="flex items-center gap-1">
      <span className="sr-only sm:not-sr-only">Theme</span>
      <select
        className="input min-h-8 w-auto py-0.5 text-sm"
        value={choice}
        onChange={(e) => setChoice(e.target.value as ThemeChoice)}
      >
        <option value="system">System</option>
        <option value="light">Light</option>
        <option value="dark">Dark</option>
      </select>
    </label>
  );
}
