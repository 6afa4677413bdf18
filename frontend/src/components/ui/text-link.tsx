import { Link, type LinkProps } from 'react-router';

/** In-app link in the copper accent, underlined so it never depends on colour alone. */
export function TextLink({ className = '', ...rest }: LinkProps) {
  return (
    <Link
      className={`font-bold text-copper-700 underline underline-offset-4 hover:text-copper-800 ${className}`}
      {...rest}
    />
  );
}
