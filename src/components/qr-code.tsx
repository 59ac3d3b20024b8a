import { useEffect, useState } from 'react';
import QRCode from 'qrcode';

/** A QR code that opens a Kettlewright address on the tablet. */
export function QrCode({ path, label, size = 160 }: { path: string; label: string; size?: number }) {
  const [src, setSrc] = useState<string | null>(null);
  const url = `${window.location.origin}${path}`;
  useEffect(() => {
    let live = true;
    void QRCode.toDataURL(url, { margin: 1, width: size, errorCorrectionLevel: 'M' }).then(
      (data) => live && setSrc(data),
    );
    return () => {
      live = false;
    };
  }, [url, size]);
  return (
    <figure className="inline-flex flex-col items-center gap-1 rounded-lg border-2 border-ink-900 bg-white p-2">
      {src ? (
        <img src={src} width={size} height={size} alt={`QR code: ${label}`} />
      ) : (
        <div style={{ width: size, height: size }} />
      )}
      <figcaption className="text-center text-sm font-bold">{label}</figcaption>
    </figure>
  );
}
