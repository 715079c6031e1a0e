export function AuthCard({ title, intro, children }: { title: string; intro?: React.ReactNode; children: React.ReactNode }) {
  return (
    <div className="rounded-[var(--radius-card)] border border-line bg-surface p-6 shadow-[var(--shadow-card)] sm:p-8">
      <h1 className="text-xl font-semibold tracking-tight">{title}</h1>
      {intro && <div className="mt-1 text-sm text-ink-muted">{intro}</div>}
      <div className="mt-6">{children}</div>
    </div>
  );
}
