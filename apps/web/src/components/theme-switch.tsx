import { useTheme, type ThemeChoice } from '../lib/theme';

const LABELS: Record<ThemeChoice, string> = { system: 'System', light: 'Light', dark: 'Dark' };

export function ThemeSwitch() {
  const [choice, setChoice] = useTheme();
  return (
    <label className="flex items-center gap-1.5 text-xs text-muted">
      Theme
      <select
        value={choice}
        onChange={(event) => setChoice(event.target.value as ThemeChoice)}
        className="rounded border border-line bg-panel px-1.5 py-1 text-xs text-ink"
      >
        {(Object.keys(LABELS) as ThemeChoice[]).map((c) => (
          <option key={c} value={c}>
            {LABELS[c]}
          </option>
        ))}
      </select>
    </label>
  );
}
