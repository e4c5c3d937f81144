import { tokens } from '@fluentui/react-components';
import { emberAccent } from '@/theme/brand-ramp';

/** Four panels about to be joined, one still in ember: the product's small mark. Decorative. */
export function BrandMark({ size = 20 }: { size?: number }) {
  return (
    <svg width={size} height={size} viewBox="0 0 20 20" aria-hidden="true" focusable="false">
      <rect x="1" y="1" width="8" height="8.5" rx="1.5" fill={tokens.colorBrandBackground} />
      <rect x="11" y="1" width="8" height="8.5" rx="1.5" fill={tokens.colorBrandBackground} />
      <rect x="1" y="10.5" width="8" height="8.5" rx="1.5" fill={tokens.colorBrandBackground} />
      <rect x="11" y="10.5" width="8" height="8.5" rx="1.5" fill={emberAccent} />
    </svg>
  );
}
