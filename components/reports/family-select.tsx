/** The "Motor family" field of a report's GET form: every family, or one by its slug. */
export function FamilySelect({ value, families, className }: {
  value: string | null;
  families: { slug: string; name: string }[];
  className: string;
}) {
  return (
    <label className="flex flex-col gap-1 text-sm font-medium text-ink-soft">
      Motor family
      <select name="family" defaultValue={value ?? ""} className={className}>
        <option value="">All families</option>
        {families.map((f) => <option key={f.slug} value={f.slug}>{f.name}</option>)}
      </select>
    </label>
  );
}
