import type { ReactNode } from 'react';
import { cn } from '@/lib/cn';

export function Card({ children, className }: { children: ReactNode; className?: string }) {
  return <section className={cn('rounded-card border border-rule bg-paper-raised p-5 shadow-card sm:p-6', className)}>{children}</section>;
}
