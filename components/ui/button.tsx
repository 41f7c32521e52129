import type { ButtonHTMLAttributes } from 'react';

type Variant = 'primary' | 'secondary' | 'danger' | 'ghost';

const styles: Record<Variant, string> = {
  primary: 'bg-mains text-white hover:bg-[#0B5E58] disabled:bg-[#7AA8A3]',
  secondary: 'bg-white text-ink border border-line hover:bg-[#EFECE4]',
  danger: 'bg-fail text-white hover:bg-[#951717]',
  ghost: 'text-ink hover:bg-[#EFECE4]',
};

export function buttonClass(variant: Variant = 'primary', extra = '') {
  return `inline-flex items-center justify-center gap-2 rounded-md px-3.5 py-2 text-sm font-medium transition-colors disabled:cursor-not-allowed ${styles[variant]} ${extra}`;
}

export function Button({ variant = 'primary', className = '', ...props }: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant }) {
  return <button type="button" className={buttonClass(variant, className)} {...props} />;
}
