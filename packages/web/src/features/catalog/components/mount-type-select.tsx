import { MenuItem } from '@blueprintjs/core';
import { MultiSelect, type ItemPredicate, type ItemRenderer } from '@blueprintjs/select';

import { MOUNT_TYPES, type MountType } from '../types';
import { MOUNT_TYPE_LABELS } from '../utils/mount-labels';

const filterType: ItemPredicate<MountType> = (query, type) => MOUNT_TYPE_LABELS[type].toLowerCase().includes(query.trim().toLowerCase());

export interface MountTypeSelectProps {
  id: string;
  value: readonly MountType[];
  onChange: (types: MountType[]) => void;
}

/** Pick any number of mount types; none picked means every type. */
export function MountTypeSelect({ id, value, onChange }: MountTypeSelectProps) {
  const toggle = (type: MountType) => {
    onChange(
      value.includes(type) ? value.filter((item) => item !== type) : MOUNT_TYPES.filter((item) => item === type || value.includes(item)),
    );
  };

  const renderType: ItemRenderer<MountType> = (type, { handleClick, handleFocus, modifiers }) => {
    if (!modifiers.matchesPredicate) return null;
    return (
      <MenuItem
        key={type}
        text={MOUNT_TYPE_LABELS[type]}
        roleStructure="listoption"
        selected={value.includes(type)}
        active={modifiers.active}
        disabled={modifiers.disabled}
        onClick={handleClick}
        onFocus={handleFocus}
      />
    );
  };

  return (
    <MultiSelect<MountType>
      items={[...MOUNT_TYPES]}
      selectedItems={[...value]}
      itemRenderer={renderType}
      itemPredicate={filterType}
      onItemSelect={toggle}
      onRemove={(type) => toggle(type)}
      onClear={value.length > 0 ? () => onChange([]) : undefined}
      tagRenderer={(type) => MOUNT_TYPE_LABELS[type]}
      placeholder="All types"
      resetOnSelect
      noResults={<MenuItem disabled text="No type matches" roleStructure="listoption" />}
      popoverProps={{ minimal: true, matchTargetWidth: true }}
      tagInputProps={{ inputProps: { id, 'aria-label': 'Mount types' }, tagProps: { minimal: true } }}
      menuProps={{ 'aria-label': 'Mount types' }}
      className="tc-catalog-type-select"
    />
  );
}
