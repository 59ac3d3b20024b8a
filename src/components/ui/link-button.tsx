import { Link, type LinkProps } from 'react-router-dom';
import { buttonClass, type Size, type Variant } from './button';

/** A link that looks and sizes like a Button (touch-sized), e.g. "Print labels" or "Vessel board". */
export function LinkButton({
  variant = 'secondary',
  size,
  className,
  ...rest
}: LinkProps & { variant?: Variant; size?: Size }) {
  return <Link className={buttonClass({ variant, size, className })} {...rest} />;
}
