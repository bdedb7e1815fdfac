import { Callout } from '@blueprintjs/core';
import { WarningSignIcon } from '@blueprintjs/icons';

/**
 * The cautions every result in Tacet carries (PRODUCT.md, "Cautions the product shows").
 * Shown on the overview and, later, on the design screen and in the report.
 */
export function SafetyCautions({ compact = false }: { compact?: boolean }) {
  return (
    <Callout intent="warning" icon={<WarningSignIcon />} title="Results are for preliminary sizing" className="tc-cautions">
      <p>
        Tacet models a rigid machine on linear mounts over a rigid support. Real floors, decks and frames flex, and mounts are not perfectly
        linear.
      </p>
      {compact ? null : (
        <p>
          Seismic and wind restraint, snubbers, flexible pipe and cable connections, flexible floors and guarding follow local codes, and
          need review by a qualified, licensed engineer before anything is built or bought.
        </p>
      )}
    </Callout>
  );
}
