import { Button } from '@blueprintjs/core';
import { PlusIcon, TrashIcon } from '@blueprintjs/icons';
import { FieldArray, useFormikContext } from 'formik';

import type { DesignFormValues } from '../schemas/design-form';
import { blankSkipBand, SOURCE_LIMITS } from '../schemas/sources-form';
import { CellInput, ListError } from './form-cells';

/** Speed bands the drive is set to skip: the verdict leaves them out. */
export function SkipBands({ readOnly }: { readOnly: boolean }) {
  const { values } = useFormikContext<DesignFormValues>();
  const bands = values.operating.skipBands;
  return (
    <FieldArray name="operating.skipBands">
      {({ push, remove }) => (
        <div className="tc-skip-bands" role="group" aria-label="Skip bands">
          <p className="tc-field-label">Skip bands</p>
          {bands.length === 0 ? <p className="tc-muted tc-note">None: the whole range is run.</p> : null}
          {bands.map((_, index) => (
            <div key={index} className="tc-skip-band" data-testid="skip-band">
              <CellInput name={`operating.skipBands[${index}].min`} label={`Skip band ${index + 1} from`} readOnly={readOnly} numeric />
              <span aria-hidden="true">to</span>
              <CellInput name={`operating.skipBands[${index}].max`} label={`Skip band ${index + 1} to`} readOnly={readOnly} numeric />
              <span className="tc-input-unit">rpm</span>
              {readOnly ? null : (
                <Button
                  variant="minimal"
                  size="small"
                  icon={<TrashIcon />}
                  aria-label={`Remove skip band ${index + 1}`}
                  title="Remove"
                  onClick={() => remove(index)}
                />
              )}
            </div>
          ))}
          <ListError name="operating.skipBands" />
          {readOnly ? null : (
            <Button
              size="small"
              variant="outlined"
              icon={<PlusIcon />}
              text="Add skip band"
              disabled={bands.length >= SOURCE_LIMITS.skipBands}
              onClick={() => push(blankSkipBand())}
            />
          )}
        </div>
      )}
    </FieldArray>
  );
}
