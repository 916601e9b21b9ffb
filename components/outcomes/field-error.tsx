/** A field's message under it; ids let the input point at it with aria-describedby. */
export function FieldError({ id, message }: { id: string; message?: string }) {
  if (!message) return null;
  return <p id={id} className="text-sm text-danger">{message}</p>;
}
