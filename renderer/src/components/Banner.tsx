import type { ReactNode } from 'react';

export function Banner(props: { tone: 'error' | 'info' | 'caution' | 'demo'; children: ReactNode; testId?: string }) {
  return (
    <div
      className={`banner banner--${props.tone}`}
      role={props.tone === 'error' ? 'alert' : 'status'}
      data-testid={props.testId}
    >
      {props.children}
    </div>
  );
}
