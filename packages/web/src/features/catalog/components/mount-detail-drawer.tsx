import { Button, Callout, Drawer, DrawerSize, Spinner, Tag } from '@blueprintjs/core';
import { ArchiveIcon, EditIcon, SmallCrossIcon, UndoIcon } from '@blueprintjs/icons';
import { lazy, Suspense } from 'react';

import { errorMessage } from '@/lib/api-errors';
import { formatNumber, useUnits } from '@/lib/units';

import { useMount } from '../api/get-mount';
import type { Mount } from '../types';
import {
  dampingText,
  displayQuantity,
  leadTimeText,
  mmToM,
  priceText,
  ratedFigures,
  temperatureRangeText,
  NO_VALUE,
} from '../utils/mount-display';
import { dampingOf } from '../utils/mount-figures';
import { mountTypeLabel } from '../utils/mount-labels';

// Charts load on first use: the catalog table does not need the charting code.
const MountCharts = lazy(() => import('./mount-charts').then((module) => ({ default: module.MountCharts })));

export interface MountDetailDrawerProps {
  mountId: number | null;
  /** The table row, shown at once while the latest version loads. */
  placeholder?: Mount;
  canWrite: boolean;
  onClose: () => void;
  onEdit: (mount: Mount) => void;
  onRetire: (mount: Mount) => void;
  onRestore: (mount: Mount) => void;
  restoring?: boolean;
  /** Why the last restore failed, in words. */
  actionError?: string | null;
}

function Fact({ label, value, note }: { label: string; value: string; note?: string }) {
  return (
    <>
      <dt>{label}</dt>
      <dd>
        {value}
        {note ? <span className="tc-muted"> · {note}</span> : null}
      </dd>
    </>
  );
}

const dateFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });

function dateText(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? NO_VALUE : dateFormat.format(date);
}

function MountDetails({ mount }: { mount: Mount }) {
  const units = useUnits();
  const { deflectionM, naturalFrequencyHz } = ratedFigures(mount);
  const maxDeflectionM = mmToM(mount.maxDeflectionMm);
  const damping = dampingOf(mount);
  const travelUsed =
    maxDeflectionM !== null && maxDeflectionM > 0 && Number.isFinite(deflectionM)
      ? `${formatNumber((deflectionM / maxDeflectionM) * 100, 0)} % of the maximum deflection`
      : undefined;

  return (
    <>
      <section className="tc-mount-section" aria-labelledby="mount-rated-title">
        <h3 className="tc-subsection-title" id="mount-rated-title">
          At the rated load
        </h3>
        <dl className="tc-facts tc-mount-facts">
          <Fact label="Static deflection" value={displayQuantity(units, 'deflection', deflectionM)} note={travelUsed} />
          <Fact label="Natural frequency" value={displayQuantity(units, 'frequency', naturalFrequencyHz)} />
        </dl>
        <p className="tc-muted tc-mount-note">
          Computed from the catalog values: static deflection is the rated load divided by the vertical stiffness; the vertical natural
          frequency follows from that deflection and the dynamic stiffness ratio.
        </p>
      </section>
      <section className="tc-mount-section" aria-labelledby="mount-ratings-title">
        <h3 className="tc-subsection-title" id="mount-ratings-title">
          Ratings
        </h3>
        <dl className="tc-facts tc-mount-facts">
          <Fact label="Rated load" value={displayQuantity(units, 'force', mount.ratedLoadN)} />
          <Fact label="Vertical stiffness" value={displayQuantity(units, 'stiffness', mount.verticalStiffnessNPerM)} />
          <Fact label="Horizontal stiffness" value={displayQuantity(units, 'stiffness', mount.horizontalStiffnessNPerM)} />
          <Fact
            label="Dynamic stiffness ratio"
            value={
              mount.dynamicStiffnessRatio === null
                ? 'not given (the selection assumes one and says so)'
                : formatNumber(mount.dynamicStiffnessRatio)
            }
          />
          <Fact
            label="Damping"
            value={dampingText(mount)}
            note={damping?.model === 'hysteretic' ? `about ζ ${formatNumber(damping.equivalentDampingRatio)} at resonance` : undefined}
          />
          <Fact label="Maximum deflection" value={displayQuantity(units, 'deflection', maxDeflectionM)} />
          <Fact label="Free height" value={displayQuantity(units, 'deflection', mmToM(mount.heightMm))} />
          <Fact label="Horizontal restraint rating" value={displayQuantity(units, 'force', mount.restraintCapacityN)} />
          <Fact label="Uplift rating" value={displayQuantity(units, 'force', mount.upliftCapacityN)} />
          <Fact label="Temperature range" value={temperatureRangeText(units, mount.tempMinC, mount.tempMaxC)} />
        </dl>
      </section>
      <section className="tc-mount-section" aria-labelledby="mount-buying-title">
        <h3 className="tc-subsection-title" id="mount-buying-title">
          Buying
        </h3>
        <dl className="tc-facts tc-mount-facts">
          <Fact label="Unit price" value={priceText(mount.unitPrice, mount.currency)} />
          <Fact label="Lead time" value={leadTimeText(mount.leadTimeDays)} />
          <Fact label="Last changed" value={dateText(mount.updatedAt)} />
        </dl>
      </section>
      <section className="tc-mount-section" aria-label="Charts">
        <Suspense fallback={<Spinner size={24} aria-label="Loading charts" />}>
          <MountCharts mount={mount} />
        </Suspense>
      </section>
    </>
  );
}

/** Everything about one mount, beside the table; catalog managers edit, retire or restore it here. */
export function MountDetailDrawer({
  mountId,
  placeholder,
  canWrite,
  onClose,
  onEdit,
  onRetire,
  onRestore,
  restoring = false,
  actionError = null,
}: MountDetailDrawerProps) {
  const detail = useMount(mountId, placeholder);
  const mount = detail.data;

  const title = mount ? mount.partNumber : 'Mount';
  return (
    <Drawer isOpen={mountId !== null} onClose={onClose} size={DrawerSize.STANDARD} className="tc-mount-drawer">
      {/* Blueprint's drawer carries no dialog role; this frame names it for assistive technology. */}
      <div className="tc-mount-drawer-frame" role="dialog" aria-modal="true" aria-labelledby="mount-drawer-title">
        <div className="bp6-drawer-header">
          <h2 className="bp6-heading tc-mount-drawer-title" id="mount-drawer-title">
            {mount ? <span className="tc-visually-hidden">Mount</span> : null} {title}
          </h2>
          <Button variant="minimal" icon={<SmallCrossIcon />} aria-label="Close" onClick={onClose} />
        </div>
        <div className="tc-mount-drawer-body">
          {detail.isError && !mount ? (
            <Callout intent="danger" title="This mount could not be loaded">
              {errorMessage(detail.error)}
            </Callout>
          ) : null}
          {!mount && detail.isPending ? <Spinner size={32} aria-label="Loading the mount" /> : null}
          {mount ? (
            <>
              <div className="tc-mount-heading">
                <p className="tc-mount-subtitle">
                  {mount.supplier.name} · {mountTypeLabel(mount.mountType)}
                  {mount.series ? ` · series ${mount.series}` : ''}
                </p>
                {mount.active ? (
                  <Tag minimal intent="success">
                    Active
                  </Tag>
                ) : (
                  <Tag minimal>Retired</Tag>
                )}
              </div>
              {!mount.active ? (
                <Callout intent="warning" className="tc-mount-retired">
                  Retired: selections no longer offer this mount. Designs that already use it keep their figures.
                </Callout>
              ) : null}
              {canWrite ? (
                <div className="tc-mount-actions">
                  <Button icon={<EditIcon />} text="Edit" onClick={() => onEdit(mount)} />
                  {mount.active ? (
                    <Button icon={<ArchiveIcon />} intent="danger" variant="outlined" text="Retire" onClick={() => onRetire(mount)} />
                  ) : (
                    <Button icon={<UndoIcon />} text="Restore" loading={restoring} onClick={() => onRestore(mount)} />
                  )}
                </div>
              ) : null}
              {actionError ? (
                <Callout intent="danger" role="alert" className="tc-mount-action-error">
                  {actionError}
                </Callout>
              ) : null}
              <MountDetails mount={mount} />
            </>
          ) : null}
        </div>
      </div>
    </Drawer>
  );
}
