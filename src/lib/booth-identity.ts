import type { CSSProperties } from 'react';

/**
 * Each booth's own look on the planner and the day board: a tint for its blocks and a patterned
 * band in a darker ink, so two booths side by side are told apart at a glance (and by pattern,
 * not colour alone). Always shown with the booth's name.
 */
export interface BoothIdentity {
  /** Block background. */
  tint: string;
  /** Band and border colour. */
  ink: string;
  /** The band's pattern in words, for anyone who asks what the marks mean. */
  pattern: string;
  /** CSS background drawing the band. */
  band: CSSProperties;
}

const stripes = (ink: string, angle: number) => `repeating-linear-gradient(${angle}deg, ${ink} 0 3px, transparent 3px 6px)`;

const looks: { tint: string; ink: string; pattern: string; background: (ink: string) => string }[] = [
  { tint: '#e7f3ee', ink: '#1b5246', pattern: 'solid band', background: (ink) => ink },
  { tint: '#fbefd9', ink: '#8a4b00', pattern: 'diagonal stripes', background: (ink) => stripes(ink, 45) },
  { tint: '#e5edf8', ink: '#1f4e8c', pattern: 'dots', background: (ink) => `radial-gradient(${ink} 1.7px, transparent 2px) 0 0 / 6px 6px` },
  { tint: '#f4e7f1', ink: '#7a2d6b', pattern: 'cross-hatch', background: (ink) => `${stripes(ink, 45)}, ${stripes(ink, -45)}` },
  { tint: '#eef0e0', ink: '#4f5d16', pattern: 'level bars', background: (ink) => stripes(ink, 0) },
  { tint: '#eceff2', ink: '#37474f', pattern: 'upright bars', background: (ink) => stripes(ink, 90) },
];

export function boothIdentity(position: number): BoothIdentity {
  const look = looks[((position % looks.length) + looks.length) % looks.length];
  // Patterns are drawn over white, so the band reads the same on any block colour.
  const background = look.pattern === 'solid band' ? look.ink : `${look.background(look.ink)}, #ffffff`;
  return { tint: look.tint, ink: look.ink, pattern: look.pattern, band: { background } };
}

/** Identities by booth id, from the booths' order (by id) at the site on screen. */
export function boothIdentities(boothIds: number[]): Map<number, BoothIdentity> {
  return new Map([...boothIds].sort((a, b) => a - b).map((id, position) => [id, boothIdentity(position)]));
}
