/**
 * The real player in a 16:9 frame, playing this channel's feed through the signed-in session
 * (`/kiosk?preview=<id>`). Keyed on the channel's version, so the frame reloads after each edit and
 * the change shows at once.
 */
export function PlayerPreview({ channelId, version }: { channelId: string; version: number }) {
  return (
    <figure className="space-y-2">
      <div className="relative aspect-video w-full overflow-hidden rounded-lg border border-rule bg-black">
        <iframe
          key={version}
          title="Live preview of the kiosk player"
          src={`/kiosk?preview=${channelId}`}
          className="absolute inset-0 h-full w-full border-0"
        />
      </div>
      <figcaption className="text-xs text-muted">
        Live preview at 16:9, exactly as the screens play it now (slides outside their dates are left out).
      </figcaption>
    </figure>
  );
}
