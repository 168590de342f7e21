import { Toaster } from 'sonner';

/**
 * Pop-up messages in Boothwright's own look: Work Sans, the theme's panels and verdict colours,
 * dark words on a light ground so every message passes contrast, and 44 px buttons for gloved hands.
 * `unstyled` drops the library's own look; it still places, times and swipes the messages. `expand` lists them
 * one under another rather than stacked, so each stays readable and whole-sized.
 */
const classNames = {
  toast: 'flex w-full items-center gap-3 rounded-panel border border-l-8 p-3 pl-4 font-sans text-base shadow-lg',
  title: 'font-semibold',
  description: 'text-maple-800',
  content: 'min-w-0 flex-1',
  icon: 'flex shrink-0 items-center',
  success: 'border-lacquer-600 bg-lacquer-50 text-lacquer-900',
  error: 'border-verdict-stop bg-white text-verdict-stop',
  warning: 'border-verdict-caution bg-maple-50 text-maple-900',
  info: 'border-lacquer-400 bg-white text-maple-900',
  default: 'border-maple-400 bg-white text-maple-900',
  loading: 'border-maple-400 bg-white text-maple-900',
  actionButton: 'min-h-touch shrink-0 rounded-panel bg-lacquer-700 px-4 font-semibold text-white hover:bg-lacquer-800',
  cancelButton: 'min-h-touch shrink-0 rounded-panel border border-maple-400 bg-white px-4 font-semibold text-maple-900 hover:bg-maple-100',
  closeButton: 'order-last grid min-h-touch min-w-touch shrink-0 place-items-center rounded-panel text-maple-800 hover:bg-maple-100',
};

export function BoothwrightToaster() {
  return <Toaster position="top-center" expand closeButton duration={5000} toastOptions={{ unstyled: true, classNames, closeButtonAriaLabel: 'Close message' }} />;
}
