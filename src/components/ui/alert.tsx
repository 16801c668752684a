import type { ReactNode } from 'react';

const TONE_CLASSES = {
  danger: 'border-danger bg-danger-tint text-danger',
  ok: 'border-ok bg-ok-tint text-ok',
  info: 'border-line-strong bg-paper text-ink',
} as const;

/** A message block; errors are announced (`role="alert"`), other tones politely (`role="status"`). */
export function Alert({
  tone,
  title,
  children,
}: {
  tone: keyof typeof TONE_CLASSES;
  title?: string;
  children: ReactNode;
}) {
  return (
    <div
      role={tone === 'danger' ? 'alert' : 'status'}
      className={`rounded-md border-l-4 px-4 py-3 ${TONE_CLASSES[tone]}`}
    >
      {title ? <p className="font-bold">{title}</p> : null}
      <div>{children}</div>
    </div>
  );
}
