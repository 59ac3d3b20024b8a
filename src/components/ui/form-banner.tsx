/** A form's overall message (e.g. the server's answer), shown above its fields. */
export function FormBanner({ message }: { message?: string | null }) {
  if (!message) return null;
  return (
    <p role="alert" className="rounded-lg bg-ember-100 px-4 py-3 font-medium text-ember-700">
      {message}
    </p>
  );
}
