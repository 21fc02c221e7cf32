import { Button } from './button';
import { INPUT_CLASS } from './field';

/**
 * A list's search box: a labelled search field and a Search button. The
 * route keeps the text (it may mirror the URL) and hears the trimmed query
 * on submit.
 */
export function SearchForm({
  id,
  label,
  placeholder,
  value,
  onChange,
  onSearch,
  className = 'mb-3 max-w-md',
}: {
  readonly id: string;
  /** Read by screen readers only. */
  readonly label: string;
  readonly placeholder: string;
  readonly value: string;
  readonly onChange: (value: string) => void;
  readonly onSearch: (query: string) => void;
  readonly className?: string;
}) {
  return (
    <form
      role="search"
      className={`flex items-center gap-2 ${className}`}
      onSubmit={(event) => {
        event.preventDefault();
        onSearch(value.trim());
      }}
    >
      <label htmlFor={id} className="sr-only">
        {label}
      </label>
      <input
        id={id}
        type="search"
        className={INPUT_CLASS}
        placeholder={placeholder}
        value={value}
        onChange={(event) => onChange(event.target.value)}
      />
      <Button type="submit">Search</Button>
    </form>
  );
}
