import { Callout } from '@blueprintjs/core';
import { WarningSignIcon } from '@blueprintjs/icons';
import { CAUTIONS, cautionsFor, type CautionUse } from '@tacet/vibration';

export interface SafetyCautionsProps {
  /** `design`: every design tab and the results; `supplier`: what goes to a supplier (purchasing). */
  use?: CautionUse;
  /** The design asks for a seismic restraint check: its caution is added. */
  restraint?: boolean;
  /** Only the general caution (the overview). */
  compact?: boolean;
}

/**
 * The cautions every result in Tacet carries (PRODUCT.md, "Cautions the product shows"), in the
 * words of the one source the report, the BOM files and the supplier e-mails use
 * (`cautionsFor` in @tacet/vibration).
 */
export function SafetyCautions({ use = 'design', restraint = false, compact = false }: SafetyCautionsProps) {
  const [general, ...rest] = compact ? [CAUTIONS.general] : cautionsFor(use, { restraint });
  return (
    <Callout intent="warning" icon={<WarningSignIcon />} title={general.title} className="tc-cautions" data-testid="cautions">
      <p>{general.text}</p>
      {rest.map((caution) => (
        <p key={caution.id}>
          <strong>{caution.title}.</strong> {caution.text}
        </p>
      ))}
    </Callout>
  );
}
