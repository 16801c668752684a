import type { ReactNode } from 'react';

type CardProps = {
  title?: string;
  /** Heading level of the title, so each page keeps a correct outline. */
  headingLevel?: 2 | 3;
  children: ReactNode;
  className?: string;
};

export function Card({ title, headingLevel = 2, children, className = '' }: CardProps) {
  const Heading = headingLevel === 2 ? 'h2' : 'h3';
  return (
    <section className={`rounded-lg border border-line bg-surface p-6 ${className}`}>
      {title ? <Heading className="mb-3 text-lg font-bold">{title}</Heading> : null}
      {children}
    </section>
  );
}
