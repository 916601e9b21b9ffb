/** A small mark beside a case's status: this visit is within the warranty of an earlier repair. */
export function WarrantyFlag({ repairReference }: { repairReference: string | null }) {
  if (!repairReference) return null;
  return (
    <span data-testid="warranty-flag" title={`Back within the warranty of ${repairReference}`}
      className="ml-1 whitespace-nowrap rounded border border-amber px-1.5 py-0.5 text-xs font-medium text-amber">
      warranty
    </span>
  );
}
