import type { ReactNode } from 'react';

/** Words for assistive technology only, such as the name of a table's column of buttons. */
export function VisuallyHidden({ children }: { children: ReactNode }) {
  return (
    <span style={{ position: 'absolute', width: '1px', height: '1px', overflow: 'hidden', clip: 'rect(0 0 0 0)', clipPath: 'inset(50%)', whiteSpace: 'nowrap' }}>
      {children}
    </span>
  );
}
