type Option = { value: string; label: string };

export function SelectField({ name, label, value, errors, options, placeholder = "Choose…" }: { name: string; label: string; value?: string; errors?: string[]; options: Option[]; placeholder?: string }) {
  const id = `f-${name.replace(/\W+/g, "-")}`;
  const invalid = Boolean(errors?.length);
  return (
    <div>
      <label htmlFor={id} className="field-label">{label}</label>
      <select key={value ?? ""} id={id} name={name} defaultValue={value ?? ""} className="field-input" aria-invalid={invalid || undefined} aria-describedby={invalid ? `${id}-error` : undefined}>
        <option value="">{placeholder}</option>
        {options.map((o) => (
          <option key={o.value} value={o.value}>{o.label}</option>
        ))}
      </select>
      <p id={`${id}-error`} aria-live="polite" className="field-error" data-testid={`error-${name}`}>{errors?.join(" ")}</p>
    </div>
  );
}
