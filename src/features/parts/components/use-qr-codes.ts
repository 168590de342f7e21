import QRCode from 'qrcode';
import { useEffect, useState } from 'react';

/** SVG rather than PNG so the codes stay sharp at any print resolution. */
async function qrImage(text: string): Promise<string> {
  const svg = await QRCode.toString(text, { type: 'svg', errorCorrectionLevel: 'M', margin: 1, color: { dark: '#000000', light: '#ffffff' } });
  return `data:image/svg+xml;charset=utf-8,${encodeURIComponent(svg)}`;
}

type QrState = { key: string; images: Map<string, string> | null; failed: boolean };

/** Image sources for each text, made in the browser; null until all are ready. */
export function useQrCodes(texts: string[]): { images: Map<string, string> | null; failed: boolean } {
  const key = texts.join('\n');
  const [state, setState] = useState<QrState>({ key: '', images: null, failed: false });

  useEffect(() => {
    let current = true;
    const list = key ? key.split('\n') : [];
    Promise.all(list.map(qrImage)).then(
      (images) => current && setState({ key, images: new Map(list.map((text, i) => [text, images[i]])), failed: false }),
      () => current && setState({ key, images: null, failed: true }),
    );
    return () => {
      current = false;
    };
  }, [key]);

  // An answer for an older list of texts is not an answer for this one.
  return state.key === key ? { images: state.images, failed: state.failed } : { images: null, failed: false };
}
