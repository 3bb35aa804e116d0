export default function Loading() {
  return (
    <div role="status" aria-live="polite" className="py-16 text-center text-steel-500">
      Loading…
    </div>
  );
}
