// The same drawing as public/motifold-mark.svg: a motif tile with its corner folded back.
const petal = 'M16 16q4.2-4.6 0-9.2q-4.2 4.6 0 9.2z';

type MotifoldMarkProps = { size?: number; className?: string; title?: string };

export function MotifoldMark({ size = 32, className, title }: MotifoldMarkProps) {
  return (
    <svg
      viewBox="0 0 32 32"
      width={size}
      height={size}
      className={className}
      role={title ? 'img' : undefined}
      aria-hidden={title ? undefined : true}
      aria-label={title}
      focusable="false"
    >
      <path d="M6 4h14l8 8v14a2 2 0 0 1-2 2H6a2 2 0 0 1-2-2V6a2 2 0 0 1 2-2z" fill="var(--color-tide)" />
      <path d="M20 4v6a2 2 0 0 0 2 2h6z" fill="var(--color-ochre)" />
      <g fill="var(--color-shell)">
        {[0, 90, 180, 270].map((angle) => (
          <path key={angle} d={petal} transform={`rotate(${angle} 16 16)`} />
        ))}
      </g>
      <circle cx="16" cy="16" r="1.9" fill="var(--color-ochre)" />
    </svg>
  );
}

export function MotifoldWordmark({ className }: { className?: string }) {
  return (
    <span className={`inline-flex items-center gap-2 ${className ?? ''}`}>
      <MotifoldMark size={28} />
      <span className="text-xl font-semibold tracking-tight text-ink">Motifold</span>
    </span>
  );
}
