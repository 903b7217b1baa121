import type { KioskPairedDto } from '@shared/schemas/kiosk.ts';
import { h } from './dom.ts';
import { savePairing, type Pairing } from './storage.ts';

/**
 * The pairing screen: the code an admin was given when adding the screen is typed here once; the
 * long token that comes back is kept in this browser. Never a blank page: a revoked screen lands
 * here with a sentence saying why.
 * @param note why the form is shown (e.g. the pairing was revoked), or null
 */
export function showPairing(root: HTMLElement, note: string | null, onPaired: (pairing: Pairing) => void): void {
  const input = h('input', {
    id: 'pairing-code',
    name: 'code',
    autocomplete: 'off',
    autocapitalize: 'characters',
    spellcheck: 'false',
    inputmode: 'text',
    maxlength: '9',
    placeholder: 'K7Q-4M2',
    'aria-describedby': 'pairing-help pairing-error',
  });
  const error = h('p', { id: 'pairing-error', class: 'pairing-error', role: 'alert' });
  const button = h('button', { type: 'submit' }, 'Pair this screen');
  const form = h(
    'form',
    { class: 'pairing', 'aria-labelledby': 'pairing-title' },
    h('h1', { id: 'pairing-title', class: 'title' }, 'Pair this screen'),
    note ? h('p', { class: 'pairing-note' }, note) : null,
    h(
      'p',
      { id: 'pairing-help', class: 'body' },
      'An admin adds the screen in Starproof (Venues → the venue → Screens) and gets a six-character code. Type it here.',
    ),
    h('label', { for: 'pairing-code', class: 'pairing-label' }, 'Pairing code'),
    h('div', { class: 'pairing-row' }, input, button),
    error,
  );
  form.addEventListener('submit', (event) => {
    event.preventDefault();
    void pair(input.value, button, error, onPaired);
  });
  root.replaceChildren(h('section', { class: 'slide layout-pairing shown' }, form));
  input.focus();
}

async function pair(
  code: string,
  button: HTMLButtonElement,
  error: HTMLElement,
  onPaired: (pairing: Pairing) => void,
): Promise<void> {
  error.textContent = '';
  button.disabled = true;
  try {
    const res = await fetch('/api/kiosk/pair', {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', Accept: 'application/json' },
      body: JSON.stringify({ code }),
    });
    const body = (await res.json().catch(() => ({}))) as { data?: KioskPairedDto; error?: { message: string } };
    if (!res.ok || !body.data) {
      error.textContent = body.error?.message ?? `The server answered ${res.status}. Try again.`;
      return;
    }
    const pairing: Pairing = {
      token: body.data.token,
      screenId: body.data.screen.id,
      screenName: body.data.screen.name,
      venueName: body.data.screen.venueName,
    };
    savePairing(pairing);
    onPaired(pairing);
  } catch {
    error.textContent = 'Starproof cannot be reached from this screen. Check the network, then try again.';
  } finally {
    button.disabled = false;
  }
}
