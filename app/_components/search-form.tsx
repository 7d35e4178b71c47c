// A GET search of one list page: it works before any script runs, and its address can be shared.
export function SearchForm({
  action,
  id,
  label,
  defaultValue,
  placeholder,
  keep = {},
}: {
  action: string;
  id: string;
  label: string;
  defaultValue: string;
  placeholder: string;
  keep?: Record<string, string | undefined>;
}) {
  return (
    <form method="get" action={action} role="search" className="flex items-end gap-2">
      {Object.entries(keep).map(([name, value]) => (value ? <input key={name} type="hidden" name={name} value={value} /> : null))}
      <div>
        <label htmlFor={id} className="field-label">
          {label}
        </label>
        <input id={id} name="q" defaultValue={defaultValue} className="field w-64" placeholder={placeholder} />
      </div>
      <button type="submit" className="btn-quiet">
        Search
      </button>
    </form>
  );
}
