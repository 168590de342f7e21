import { lazy } from 'react';

// The charting library is large; it loads with the first chart drawn, never with the page itself.
export const BoothUseChart = lazy(() => import('./charts/booth-use-chart').then((m) => ({ default: m.BoothUseChart })));
export const StackedBarsChart = lazy(() => import('./charts/stacked-bars-chart').then((m) => ({ default: m.StackedBarsChart })));
export const ConditionsChart = lazy(() => import('./charts/conditions-chart').then((m) => ({ default: m.ConditionsChart })));
export const SolventChart = lazy(() => import('./charts/solvent-chart').then((m) => ({ default: m.SolventChart })));
export const MaterialChart = lazy(() => import('./charts/material-chart').then((m) => ({ default: m.MaterialChart })));
