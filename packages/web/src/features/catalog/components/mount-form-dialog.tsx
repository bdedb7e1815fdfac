import { Button, Dialog, DialogBody, DialogFooter, FormGroup, Radio, RadioGroup } from '@blueprintjs/core';
import { Form, Formik, useField, type FormikHelpers } from 'formik';
import { useMemo, useState } from 'react';

import { FormError } from '@/components/form/form-error';
import { SelectField } from '@/components/form/select-field';
import { TextField } from '@/components/form/text-field';
import { errorStatus, formFailure } from '@/lib/api-errors';
import { useUnits } from '@/lib/units';

import { useCreateMount } from '../api/create-mount';
import { useUpdateMount } from '../api/update-mount';
import { mountFormSchema, type MountFormValues } from '../schemas/mount-schema';
import { MOUNT_TYPES, type Mount, type SupplierOption } from '../types';
import { EMPTY_MOUNT_FORM, formValuesToChanges, formValuesToInput, mountToFormValues } from '../utils/mount-form-values';
import { MOUNT_TYPE_LABELS } from '../utils/mount-labels';
import { QuantityField } from './quantity-field';

/** Server field names → the form's boxes, so the server's word lands beside the right box. */
const SERVER_FIELDS: Record<string, keyof MountFormValues> = {
  supplierId: 'supplierId',
  partNumber: 'partNumber',
  series: 'series',
  mountType: 'mountType',
  ratedLoadN: 'ratedLoad',
  verticalStiffnessNPerM: 'verticalStiffness',
  horizontalStiffnessNPerM: 'horizontalStiffness',
  dynamicStiffnessRatio: 'dynamicStiffnessRatio',
  dampingRatio: 'damping',
  lossFactor: 'damping',
  maxDeflectionMm: 'maxDeflection',
  tempMinC: 'tempMin',
  tempMaxC: 'tempMax',
  heightMm: 'height',
  restraintCapacityN: 'restraintCapacity',
  upliftCapacityN: 'upliftCapacity',
  unitPrice: 'unitPrice',
  currency: 'currency',
  leadTimeDays: 'leadTimeDays',
};

/** The form's field for a server field path, when the form has one. */
const formFieldOf = (field: string): string | undefined => (Object.hasOwn(SERVER_FIELDS, field) ? SERVER_FIELDS[field] : undefined);

function DampingModelField() {
  const [field, , helpers] = useField<MountFormValues['dampingModel']>('dampingModel');
  return (
    <RadioGroup
      label="Damping model"
      name="dampingModel"
      inline
      selectedValue={field.value}
      onChange={(event) => void helpers.setValue(event.currentTarget.value as MountFormValues['dampingModel'])}
    >
      <Radio value="viscous" label="Viscous (damping ratio ζ)" />
      <Radio value="hysteretic" label="Hysteretic (loss factor η)" />
    </RadioGroup>
  );
}

function DampingField() {
  const [model] = useField<MountFormValues['dampingModel']>('dampingModel');
  return model.value === 'viscous' ? (
    <QuantityField name="damping" id="mount-damping" label="Damping ratio ζ" helperText="Between 0 and 1, e.g. 0.05" />
  ) : (
    <QuantityField name="damping" id="mount-damping" label="Loss factor η" helperText="Above 0, at most 2, e.g. 0.15" />
  );
}

export interface MountFormDialogProps {
  isOpen: boolean;
  /** The mount to edit; absent: a new mount. */
  mount?: Mount | null;
  suppliers: readonly SupplierOption[];
  onClose: () => void;
  onSaved?: (mount: Mount) => void;
}

/** Add a mount or change one (catalog managers, admins). Numbers in the user's units, stored SI. */
export function MountFormDialog({ isOpen, mount, suppliers, onClose, onSaved }: MountFormDialogProps) {
  const units = useUnits();
  const createMount = useCreateMount();
  const updateMount = useUpdateMount();
  const [failure, setFailure] = useState<string | null>(null);
  const editing = Boolean(mount);
  const schema = useMemo(() => mountFormSchema(units), [units]);
  const initialValues = useMemo(() => (mount ? mountToFormValues(mount, units) : EMPTY_MOUNT_FORM), [mount, units]);

  const supplierOptions = useMemo(() => {
    const options = suppliers
      .filter((supplier) => supplier.active || supplier.id === mount?.supplier.id)
      .map((supplier) => ({ value: String(supplier.id), label: supplier.name }));
    if (mount && !options.some((option) => option.value === String(mount.supplier.id))) {
      options.unshift({ value: String(mount.supplier.id), label: mount.supplier.name });
    }
    return [{ value: '', label: 'Choose a supplier…' }, ...options];
  }, [suppliers, mount]);
  const typeOptions = [
    { value: '', label: 'Choose a type…' },
    ...MOUNT_TYPES.map((type) => ({ value: type, label: MOUNT_TYPE_LABELS[type] })),
  ];

  const close = () => {
    setFailure(null);
    onClose();
  };

  const submit = async (values: MountFormValues, helpers: FormikHelpers<MountFormValues>) => {
    setFailure(null);
    try {
      let saved: Mount;
      if (mount) {
        const changes = formValuesToChanges(values, initialValues, units);
        saved = Object.keys(changes).length > 0 ? await updateMount.mutateAsync({ id: mount.id, changes }) : mount;
      } else {
        saved = await createMount.mutateAsync(formValuesToInput(values, units));
      }
      onSaved?.(saved);
      close();
    } catch (error) {
      const { fields, general } = formFailure(error, formFieldOf);
      helpers.setErrors(fields);
      setFailure(
        errorStatus(error) === 409 && !editing
          ? 'This supplier already has a mount with that part number. Edit that mount instead, or use another part number.'
          : general,
      );
    }
  };

  const title = mount ? `Edit ${mount.partNumber}` : 'Add a mount';
  const loadUnit = units.label('force');
  const stiffnessUnit = units.label('stiffness');
  const lengthUnit = units.label('deflection');
  const temperatureUnit = units.label('temperature');

  return (
    <Dialog title={title} isOpen={isOpen} onClose={close} className="tc-dialog tc-mount-dialog">
      <Formik<MountFormValues> initialValues={initialValues} validationSchema={schema} onSubmit={submit} enableReinitialize>
        {({ isSubmitting }) => (
          <Form noValidate aria-label={title}>
            <DialogBody>
              <div className="tc-form-grid">
                <SelectField name="supplierId" id="mount-supplier" label="Supplier" options={supplierOptions} />
                <TextField name="partNumber" id="mount-part-number" label="Part number" autoComplete="off" />
                <TextField name="series" id="mount-series" label="Series" autoComplete="off" helperText="Optional" />
                <SelectField name="mountType" id="mount-type" label="Mount type" options={typeOptions} />
                <QuantityField name="ratedLoad" id="mount-rated-load" label="Rated load" unit={loadUnit} />
                <QuantityField name="verticalStiffness" id="mount-vertical-stiffness" label="Vertical stiffness" unit={stiffnessUnit} />
                <QuantityField
                  name="horizontalStiffness"
                  id="mount-horizontal-stiffness"
                  label="Horizontal stiffness"
                  unit={stiffnessUnit}
                  helperText="Optional; needed for the rigid-body modes"
                />
                <QuantityField
                  name="dynamicStiffnessRatio"
                  id="mount-dynamic-ratio"
                  label="Dynamic stiffness ratio"
                  helperText="Optional; 1 for steel springs, more for elastomers. Left empty, the selection assumes one on the unfavourable side and says so"
                />
              </div>
              <FormGroup className="tc-form-wide">
                <DampingModelField />
              </FormGroup>
              <div className="tc-form-grid">
                <DampingField />
                <QuantityField name="maxDeflection" id="mount-max-deflection" label="Maximum deflection" unit={lengthUnit} />
                <QuantityField name="tempMin" id="mount-temp-min" label="Lowest temperature" unit={temperatureUnit} />
                <QuantityField name="tempMax" id="mount-temp-max" label="Highest temperature" unit={temperatureUnit} />
                <QuantityField name="height" id="mount-height" label="Free height" unit={lengthUnit} />
                <QuantityField
                  name="restraintCapacity"
                  id="mount-restraint-capacity"
                  label="Horizontal restraint rating"
                  unit={loadUnit}
                  helperText="Optional; strength level, for seismic restraint"
                />
                <QuantityField
                  name="upliftCapacity"
                  id="mount-uplift-capacity"
                  label="Uplift rating"
                  unit={loadUnit}
                  helperText="Optional; strength level, for seismic restraint"
                />
                <QuantityField name="unitPrice" id="mount-unit-price" label="Unit price" />
                <TextField name="currency" id="mount-currency" label="Currency" autoComplete="off" helperText="ISO code, e.g. USD" />
                <QuantityField name="leadTimeDays" id="mount-lead-time" label="Lead time" unit="days" />
              </div>
              <FormError message={failure} />
            </DialogBody>
            <DialogFooter
              actions={
                <>
                  <Button text="Cancel" onClick={close} disabled={isSubmitting} />
                  <Button type="submit" intent="primary" text={editing ? 'Save changes' : 'Add mount'} loading={isSubmitting} />
                </>
              }
            />
          </Form>
        )}
      </Formik>
    </Dialog>
  );
}
