import { createContext, useContext, type ReactNode } from 'react';
import { EmptyState } from '../../../components/ui/states';

/** A way out of an empty report that the page offers (early in a month: "Show last month"). */
const EmptyActionContext = createContext<ReactNode>(null);
export const EmptyActionProvider = EmptyActionContext.Provider;

export function ReportEmpty({ title, children }: { title: string; children: ReactNode }) {
  const action = useContext(EmptyActionContext);
  return (
    <EmptyState title={title}>
      <p>{children}</p>
      {action && <div className="mt-3 print:hidden">{action}</div>}
    </EmptyState>
  );
}
