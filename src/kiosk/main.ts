import '@fontsource-variable/inter';
import './kiosk.css';
import { applyOrientation } from './orientation.ts';
import { showPairing } from './pairing.ts';
import { Player } from './player.ts';
import { forgetPairing, loadPairing, type Pairing } from './storage.ts';

const root = document.getElementById('kiosk')!;
const preview = new URLSearchParams(location.search).get('preview');
if (preview) document.documentElement.classList.add('preview');
// Portrait or landscape, for the pairing form and every slide; again whenever the window changes shape.
applyOrientation();
window.addEventListener('resize', applyOrientation);

function play(pairing: Pairing): void {
  const player = new Player(root, {
    feedUrl: '/api/kiosk/feed',
    token: pairing.token,
    preview: false,
    venueName: pairing.venueName,
    screenId: pairing.screenId,
    onUnpaired: () => {
      forgetPairing();
      showPairing(root, 'This screen’s pairing was revoked or is no longer known. Ask an admin for a new pairing code.', play);
    },
  });
  player.start();
}

if (preview && /^[0-9a-f-]{36}$/i.test(preview)) {
  // The staff app's live preview: the channel's feed through the signed-in session.
  document.documentElement.classList.add('preview');
  new Player(root, {
    feedUrl: `/api/channels/${preview}/preview-feed`,
    token: null,
    preview: true,
    venueName: '',
    screenId: null,
    onUnpaired: () => {
      root.textContent = 'Sign in to Starproof as an editor or admin to preview this channel.';
    },
  }).start();
} else {
  if ('serviceWorker' in navigator) {
    // Keeps the player itself (HTML, scripts, fonts) for a reload during an outage.
    navigator.serviceWorker.register('/kiosk-sw.js', { scope: '/kiosk' }).catch(() => undefined);
  }
  const pairing = loadPairing();
  if (pairing) play(pairing);
  else showPairing(root, null, play);
}
