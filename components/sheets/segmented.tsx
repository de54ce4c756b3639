// A small choice of two or three options as a radio group (keyboard: arrows move, as radios do).
export interface SegmentedProps<T extends string> {
  legend: string;
  name: string;
  value: T;
  options: ReadonlyArray<{ value: T; label: string }>;
  onChange: (v: T) => void;
  disabled?: boolean;
}

export function Segmented<T extends string>({ legend, name, value, options, onChange, disabled }: SegmentedProps<T>) {
  return (
    <fieldset disabled={disabled}>
      <legend className="field-label">{legend}</legend>
      <div className="mt-1 inline-flex flex-wrap rounded-md border border-rule bg-white p-0.5">
        {options.map((o) => (
          <label key={o.value} className={`flex min-h-touch cursor-pointer items-center rounded px-3 text-sm font-medium has-[:focus-visible]:outline has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-verdigris-500 ${value === o.value ? 'bg-verdigris-700 text-white' : 'text-ink hover:bg-paper-deep'}`}>
            <input type="radio" className="sr-only" name={name} value={o.value} checked={value === o.value} onChange={() => onChange(o.value)} />
            {o.label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
