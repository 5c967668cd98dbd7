import { Link, type LinkProps } from 'react-router-dom';
import { cn } from '@/lib/cn';

export const textLinkClasses = 'font-medium text-patina-700 underline decoration-patina-300 underline-offset-3 hover:decoration-patina-600';

export function TextLink({ className, ...props }: LinkProps) {
  return <Link className={cn(textLinkClasses, className)} {...props} />;
}
