import type { HTMLAttributes, TdHTMLAttributes, ThHTMLAttributes } from 'react';
import { cx } from './cx';

export function Table({ className, ...rest }: HTMLAttributes<HTMLTableElement>) {
  return (
    <div className="overflow-x-auto rounded-xl border border-mist-200 bg-white">
      <table className={cx('w-full border-collapse text-left text-base', className)} {...rest} />
    </div>
  );
}

export function Th({ className, ...rest }: ThHTMLAttributes<HTMLTableCellElement>) {
  return (
    <th
      className={cx('border-b-2 border-mist-200 bg-mist-100 px-4 py-3 text-sm font-semibold text-ink-700', className)}
      {...rest}
    />
  );
}

export function Td({ className, ...rest }: TdHTMLAttributes<HTMLTableCellElement>) {
  return <td className={cx('border-b border-mist-100 px-4 py-3 tabular-nums', className)} {...rest} />;
}
