import { NavLink } from 'react-router-dom';
import type { Role } from '../../shared/permissions';
import { navFor } from './nav-items';

const linkClasses = ({ isActive }: { isActive: boolean }) =>
  'flex min-h-touch items-center rounded-panel px-3 py-2 font-medium ' +
  (isActive ? 'bg-lacquer-700 text-white' : 'text-maple-900 hover:bg-maple-200');

export function MainNav({ role, onNavigate }: { role: Role; onNavigate: () => void }) {
  return (
    <div className="space-y-5">
      {navFor(role).map((group) => (
        <div key={group.label}>
          <h2 className="mb-1 px-3 text-xs font-semibold uppercase tracking-wider text-maple-700">{group.label}</h2>
          <ul className="space-y-1">
            {group.items.map((item) => (
              <li key={item.to}>
                <NavLink to={item.to} end={item.end} className={linkClasses} onClick={onNavigate}>
                  {({ isActive }) => (
                    <>
                      <span aria-hidden="true" className={`mr-2 inline-block h-5 w-1 rounded-full ${isActive ? 'bg-lacquer-200' : 'bg-transparent'}`} />
                      {item.label}
                    </>
                  )}
                </NavLink>
              </li>
            ))}
          </ul>
        </div>
      ))}
    </div>
  );
}
