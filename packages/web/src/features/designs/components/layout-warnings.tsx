import { Callout } from '@blueprintjs/core';

import type { Units } from '@/lib/units';
import type { MountPoint } from '@/types/design-api';

import type { LayoutWarning } from '../hooks/use-design-figures';

const TITLES: Record<LayoutWarning['code'], string> = {
  'cg-outside-mount-polygon': 'Centre of gravity outside the mounts',
  'mount-lift-off': 'A mount point lifts off',
  'mount-overloaded': 'A mount is overloaded',
  'too-few-mounts': 'Too few mount points',
  'collinear-mounts': 'Mount points in one line',
  input: 'Loads cannot be computed',
};

function pointLabel(warning: LayoutWarning, points: readonly MountPoint[] | null): string {
  if (warning.pointIndex === undefined) return '?';
  return points?.[warning.pointIndex]?.label || `${warning.pointIndex + 1}`;
}

function titleOf(warning: LayoutWarning, points: readonly MountPoint[] | null): string {
  return warning.code === 'mount-lift-off' ? `Point ${pointLabel(warning, points)} lifts off` : TITLES[warning.code];
}

function describe(warning: LayoutWarning, points: readonly MountPoint[] | null, units: Units): string {
  switch (warning.code) {
    case 'cg-outside-mount-polygon':
      return 'The centre of gravity lies outside (or on the edge of) the polygon of the mount points: the machine would tip. Move mounts outward or rearrange the equipment.';
    case 'mount-lift-off': {
      const label = pointLabel(warning, points);
      const pull = warning.loadN !== undefined ? ` (it would have to pull ${units.format('force', -warning.loadN)})` : '';
      return `Point ${label} would lift off${pull}. Move the mounts or the centre of gravity so every point carries load.`;
    }
    case 'too-few-mounts':
      return 'A frame needs at least three mount points to stand on.';
    case 'collinear-mounts':
      return 'All mount points lie on one line, so the frame would tip over it. Move at least one point off the line.';
    default:
      return warning.message;
  }
}

/** The layout problems the calculation library reports, in words. */
export function LayoutWarnings({
  warnings,
  points,
  units,
}: {
  warnings: readonly LayoutWarning[];
  points: readonly MountPoint[] | null;
  units: Units;
}) {
  if (warnings.length === 0) return null;
  return (
    <div className="tc-callout-stack">
      {warnings.map((warning, index) => (
        <Callout key={`${warning.code}-${index}`} intent="warning" title={titleOf(warning, points)} role="alert">
          {describe(warning, points, units)}
        </Callout>
      ))}
    </div>
  );
}
