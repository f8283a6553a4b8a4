export default function Loading() {
  return (
    <div aria-busy="true" aria-label="Loading" className="animate-pulse space-y-3">
      <div className="h-8 w-48 rounded bg-slate-200" />
      {Array.from({ length: 8 }, (_, i) => (
        <div key={i} className="h-9 rounded bg-slate-200" />
      ))}
    </div>
  );
}
