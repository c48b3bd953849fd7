type LogoMarkProps = {
  size?: number;
  // Omit when the mark sits beside the written name, so screen readers do not hear it twice.
  title?: string;
};

// Four observations, their residuals and the fitted line through them. Colours are set
// through style rather than SVG attributes so they can follow the brand custom properties.
export function LogoMark({ size = 28, title }: LogoMarkProps) {
  const labelled = title !== undefined;
  return (
    <svg
      viewBox="0 0 32 32"
      width={size}
      height={size}
      role={labelled ? 'img' : undefined}
      aria-hidden={labelled ? undefined : true}
      focusable="false"
      className="ll-logo-mark"
    >
      {labelled ? <title>{title}</title> : null}
      <rect width="32" height="32" rx="8" style={{ fill: 'var(--ll-brand-ink)' }} />
      <path
        d="M8 24V21.45M13 15V18.05M18 17.5V14.64M24 9V10.55"
        style={{ stroke: 'var(--ll-brand-point)' }}
        strokeOpacity="0.55"
        strokeWidth="1.2"
        strokeLinecap="round"
      />
      <path d="M5 23.5L27 8.5" style={{ stroke: 'var(--ll-brand-fit)' }} strokeWidth="2.4" strokeLinecap="round" />
      <g style={{ fill: 'var(--ll-brand-point)' }}>
        <circle cx="8" cy="24" r="2.1" />
        <circle cx="13" cy="15" r="2.1" />
        <circle cx="18" cy="17.5" r="2.1" />
        <circle cx="24" cy="9" r="2.1" />
      </g>
    </svg>
  );
}
