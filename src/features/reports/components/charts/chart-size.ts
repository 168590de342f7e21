import { useSyncExternalStore } from 'react';
import { chartHeight } from '../chart-frame';

/** About the printable width of A4 and of Letter in portrait with 12 mm margins, in CSS pixels. */
const paperWidth = 700;

let printing = false;

function subscribe(onChange: () => void) {
  const media = window.matchMedia('print');
  const before = () => {
    printing = true;
    onChange();
  };
  const after = () => {
    printing = media.matches;
    onChange();
  };
  window.addEventListener('beforeprint', before);
  window.addEventListener('afterprint', after);
  media.addEventListener('change', after);
  return () => {
    window.removeEventListener('beforeprint', before);
    window.removeEventListener('afterprint', after);
    media.removeEventListener('change', after);
  };
}

const isPrinting = () => printing || window.matchMedia('print').matches;

/**
 * The chart's size: the width of its box on screen; on paper, redrawn at the page's width before
 * the browser lays the page out (the store's change is rendered straight away, inside the
 * beforeprint event), so the lettering prints at its real size rather than a shrunk screen chart.
 */
export function useChartSize(height = chartHeight) {
  const print = useSyncExternalStore(subscribe, isPrinting, () => false);
  return print ? { responsive: false, width: paperWidth, height: Math.round(height * 0.85) } : { responsive: true, style: { width: '100%', height } };
}
