import type { ReactNode } from 'react';
import { Icon } from './icon.tsx';

type Tone = 'info' | 'success' | 'warning' | 'error';

const TONES: Record<Tone, { box: string; icon: 'info' | 'check' | 'alert' }> = {
  info: { box: 'border-rule bg-wash text-ink', icon: 'info' },
  success: { box: 'border-ok/40 bg-ok/10 text-ink', icon: 'check' },
  warning: { box: 'border-changed/40 bg-changed/10 text-ink', icon: 'alert' },
  error: { box: 'border-broken/40 bg-broken/10 text-ink', icon: 'alert' },
};

/** A boxed message with an icon and a word, never colour alone. */
export function Notice({ tone = 'info', title, children }: { tone?: Tone; title?: string; children?: ReactNode }) {
  const style = TONES[tone];
  return (
    <div role={tone === 'error' ? 'alert' : 'status'} className={`flex gap-3 rounded-md border px-3.5 py-3 text-sm ${style.box}`}>
      <Icon
        name={style.icon}
        className={`mt-0.5 size-4 shrink-0 ${tone === 'error' ? 'text-broken' : tone === 'warning' ? 'text-changed' : tone === 'success' ? 'text-ok' : 'text-muted'}`}
      />
      <div>
        {title && <p className="font-semibold">{title}</p>}
        {children && <div className={title ? 'mt-0.5' : ''}>{children}</div>}
      </div>
    </div>
  );
}
