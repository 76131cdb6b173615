/** A validation message under a field, linked to it by id. */
export function FieldError({ id, message }: { id: string; message?: string }) {
  if (!message) return null;
  return (
    <span id={id} className="upwell-field-error" role="alert">
      {message}
    </span>
  );
}
