import QRCode from 'qrcode';
import { useEffect, useState } from 'react';

export interface JoinQrCodeProps {
  /** What the code opens. */
  url: string;
  joinCode: string;
}

/** A QR code as an SVG image (no canvas needed), so phones can open the join page directly. */
export function JoinQrCode({ url, joinCode }: JoinQrCodeProps) {
  const [src, setSrc] = useState<string | null>(null);

  useEffect(() => {
    let current = true;
    QRCode.toString(url, { type: 'svg', errorCorrectionLevel: 'M', margin: 2 })
      .then((svg) => {
        if (current) setSrc(`data:image/svg+xml;charset=utf-8,${encodeURIComponent(svg)}`);
      })
      .catch(() => {
        if (current) setSrc(null); // the written address still works
      });
    return () => {
      current = false;
    };
  }, [url]);

  if (!src) return <div className="host-qr" aria-hidden="true" />;
  return <img className="host-qr" src={src} alt={`QR code to join with code ${joinCode}`} />;
}
