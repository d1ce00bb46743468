export function FormError({ message }: { message?: string | null }) {
  if (!message) return null;
  return (
    <p role="alert" className="rounded-md border border-band-off/40 bg-white px-3 py-2 text-sm text-band-off">
      {message}
    </p>
  );
}
