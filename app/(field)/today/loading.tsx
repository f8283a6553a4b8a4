export default function Loading() {
  return (
    <div aria-busy="true" aria-label="Loading" className="animate-pulse space-y-4">
      {Array.from({ length: 3 }, (_, i) => (
        <div key={i} className="h-32 rounded-xl bg-slate-200" />
      ))}
    </div>
  );
}
