/** An inline error under a control, from react-hook-form's error object (or nothing). */
export function FieldError({ error }: { error?: { message?: string } | null }) {
  if (!error?.message) return null;
  return (
    <p className="mt-1 text-sm text-failed" role="alert">
      {error.message}
    </p>
  );
}
