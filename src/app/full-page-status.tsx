/** A whole-screen message while the app finds out what to show (the sign-in check, a page's code on first load). */
export function FullPageStatus({ children }: { children: string }) {
  return (
    <div className="grid min-h-dvh place-items-center p-6">
      <p role="status" className="text-lg text-maple-700">
        {children}
      </p>
    </div>
  );
}
