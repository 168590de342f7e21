import { useEffect, useRef, useState } from 'react';
import { Button } from '../../../components/ui/button';

// Not yet in TypeScript's DOM library; only what is used here.
interface DetectedCode {
  rawValue: string;
}
interface CodeDetector {
  detect(source: HTMLVideoElement): Promise<DetectedCode[]>;
}
type CodeDetectorConstructor = new (options: { formats: string[] }) => CodeDetector;

function detectorClass(): CodeDetectorConstructor | null {
  const candidate = (window as unknown as { BarcodeDetector?: CodeDetectorConstructor }).BarcodeDetector;
  return typeof candidate === 'function' ? candidate : null;
}

/** Whether this device has a camera the page may ask for; typing the code always works. */
export const canScanTags = () => Boolean(navigator.mediaDevices?.getUserMedia);

type CodeReader = (frame: HTMLVideoElement) => Promise<string | null>;

/**
 * The browser's own QR reader where it has one; elsewhere (Safari, Firefox) the jsQR library,
 * loaded only when the camera opens, reads frames drawn onto a canvas.
 */
async function codeReader(): Promise<CodeReader> {
  const Detector = detectorClass();
  if (Detector) {
    const detector = new Detector({ formats: ['qr_code'] });
    return async (frame) => (await detector.detect(frame).catch(() => []))[0]?.rawValue ?? null;
  }
  const { default: jsQR } = await import('jsqr');
  const canvas = document.createElement('canvas');
  const context = canvas.getContext('2d', { willReadFrequently: true });
  return async (frame) => {
    if (!context || frame.videoWidth === 0) return null;
    [canvas.width, canvas.height] = [frame.videoWidth, frame.videoHeight];
    context.drawImage(frame, 0, 0);
    return jsQR(context.getImageData(0, 0, canvas.width, canvas.height).data, canvas.width, canvas.height)?.data ?? null;
  };
}

const scanEveryMs = 300;

/** The rear camera, read a few times a second until a QR code is seen; the camera stops when closed. */
export function TagScanner({ onCode, onClose }: { onCode: (raw: string) => void; onClose: () => void }) {
  const video = useRef<HTMLVideoElement>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const found = useRef(onCode);
  useEffect(() => {
    found.current = onCode;
  }, [onCode]);

  useEffect(() => {
    let stream: MediaStream | null = null;
    let timer = 0;
    let stopped = false;
    const reader = codeReader();
    const scan = async () => {
      if (stopped || !video.current || video.current.readyState < 2) return;
      const code = await (await reader)(video.current);
      if (code && !stopped) found.current(code);
    };
    navigator.mediaDevices
      .getUserMedia({ video: { facingMode: 'environment' }, audio: false })
      .then((media) => {
        stream = media;
        if (stopped) return media.getTracks().forEach((track) => track.stop());
        if (video.current) {
          video.current.srcObject = media;
          void video.current.play();
        }
        timer = window.setInterval(() => void scan(), scanEveryMs);
      })
      .catch(() => setProblem('The camera could not be opened. Allow camera use for this site, or type the code printed on the tag.'));
    return () => {
      stopped = true;
      window.clearInterval(timer);
      stream?.getTracks().forEach((track) => track.stop());
    };
  }, []);

  return (
    <div className="rounded-panel border-2 border-lacquer-700 bg-maple-900 p-2">
      {problem ? (
        <p role="alert" className="bg-white p-3 font-medium text-verdict-stop">
          {problem}
        </p>
      ) : (
        <video ref={video} muted playsInline className="mx-auto max-h-72 w-full rounded-panel object-cover" aria-label="Camera view: hold the rack tag’s QR code in the frame" />
      )}
      <div className="mt-2 flex justify-end">
        <Button variant="secondary" onClick={onClose}>
          Stop the camera
        </Button>
      </div>
    </div>
  );
}
