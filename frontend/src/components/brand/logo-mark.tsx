import { brand } from '../../lib/theme.js';

interface LogoMarkProps {
  size?: number;
  title?: string;
}

/** Linkloom's mark: three warp threads crossed by two weft waves, i.e. pages woven together by links. */
export function LogoMark({ size = 32, title = 'Linkloom' }: LogoMarkProps) {
  return (
    <svg width={size} height={size} viewBox="0 0 32 32" role="img" aria-label={title}>
      <rect width="32" height="32" rx="8" fill={brand.ink} />
      <g fill="none" strokeLinecap="round" strokeWidth="2.6">
        <path d="M9 6v20M16 6v20M23 6v20" stroke={brand.thread} />
        <path d="M5 11c4 0 4 4 8 4s4-4 8-4 4 4 6 4M5 19c4 0 4 4 8 4s4-4 8-4 4 4 6 4" stroke={brand.saffron} />
      </g>
    </svg>
  );
}
