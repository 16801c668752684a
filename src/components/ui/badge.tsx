import type { ReactNode } from 'react';

const TONE_CLASSES = {
  neutral: 'bg-paper text-ink border-line',
  accent: 'bg-accent-tint text-accent-strong border-accent-tint',
  ok: 'bg-ok-tint text-ok border-ok-tint',
  caution: 'bg-caution-tint text-caution border-caution-tint',
  danger: 'bg-danger-tint text-danger border-danger-tint',
} as const;

export type BadgeTone = keyof typeof TONE_CLASSES;

export function Badge({ tone = 'neutral', children }: { tone?: BadgeTone; children: ReactNode }) {
  return (
    <span
      className={`inline-flex items-center rounded-full border px-2.5 py-0.5 text-sm font-semibold ${TONE_CLASSES[tone]}`}
    >
      {children}
    </span>
  );
}
