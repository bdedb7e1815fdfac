import { FormGroup, HTMLSelect, InputGroup } from '@blueprintjs/core';
import { SearchIcon } from '@blueprintjs/icons';
import { useEffect, useEffectEvent, useRef, useState } from 'react';

import { useUnits } from '@/lib/units';

import { useDebouncedValue } from '../hooks/use-debounced-value';
import type { CatalogQueryChange } from '../hooks/use-catalog-query';
import type { MountQuery, SupplierOption } from '../types';
import { MountTypeSelect } from './mount-type-select';

/** How long typing must pause before the catalog is asked again. */
export const FILTER_DEBOUNCE_MS = 300;

/** A number typed in the user's units, or `null` for an empty box; `undefined` when it is not a number. */
function parseLoad(text: string): number | null | undefined {
  const trimmed = text.trim();
  if (!trimmed) return null;
  const value = Number(trimmed);
  return Number.isFinite(value) && value >= 0 ? value : undefined;
}

function sameLoad(a: number | null, b: number | null): boolean {
  if (a === null || b === null) return a === b;
  return Number(a.toPrecision(6)) === Number(b.toPrecision(6));
}

export interface CatalogFiltersProps {
  query: MountQuery;
  suppliers: readonly SupplierOption[];
  onChange: (change: CatalogQueryChange) => void;
}

/**
 * Search and filters of the catalog page. Text boxes ask the server once typing pauses; loads
 * are typed in the user's units and sent in newtons.
 */
export function CatalogFilters({ query, suppliers, onChange }: CatalogFiltersProps) {
  const units = useUnits();
  const loadUnit = units.label('force');
  const shown = (loadN: number | null) => (loadN === null ? '' : String(Number(units.toDisplay('force', loadN).toPrecision(6))));

  const [text, setText] = useState(query.q);
  const [minText, setMinText] = useState(() => shown(query.minLoadN));
  const [maxText, setMaxText] = useState(() => shown(query.maxLoadN));
  const debouncedText = useDebouncedValue(text, FILTER_DEBOUNCE_MS);
  const debouncedMin = useDebouncedValue(minText, FILTER_DEBOUNCE_MS);
  const debouncedMax = useDebouncedValue(maxText, FILTER_DEBOUNCE_MS);

  // What this component last asked for: a query that differs from it was changed elsewhere
  // (cleared, or Back in the browser), and the boxes follow it.
  const sentText = useRef(query.q);
  const sentLoads = useRef<[number | null, number | null]>([query.minLoadN, query.maxLoadN]);

  useEffect(() => {
    if (query.q !== sentText.current) {
      sentText.current = query.q;
      setText(query.q);
    }
  }, [query.q]);

  // What the boxes show of a query changed elsewhere is read in the units of the moment.
  const showLoads = useEffectEvent((minLoadN: number | null, maxLoadN: number | null) => {
    setMinText(shown(minLoadN));
    setMaxText(shown(maxLoadN));
  });
  useEffect(() => {
    const [min, max] = sentLoads.current;
    if (!sameLoad(query.minLoadN, min) || !sameLoad(query.maxLoadN, max)) {
      sentLoads.current = [query.minLoadN, query.maxLoadN];
      showLoads(query.minLoadN, query.maxLoadN);
    }
  }, [query.minLoadN, query.maxLoadN]);

  // Typing asks the server once it pauses; only the typed text decides when (the query and the
  // callback are read as they are at that moment).
  const sendText = useEffectEvent((typed: string) => {
    const q = typed.trim();
    if (q !== query.q.trim()) {
      sentText.current = q;
      onChange({ q });
    }
  });
  useEffect(() => {
    sendText(debouncedText);
  }, [debouncedText]);

  const sendLoads = useEffectEvent((minTyped: string, maxTyped: string) => {
    const min = parseLoad(minTyped);
    const max = parseLoad(maxTyped);
    if (min === undefined || max === undefined) return;
    const minLoadN = min === null ? null : units.toSi('force', min);
    const maxLoadN = max === null ? null : units.toSi('force', max);
    if (!sameLoad(minLoadN, query.minLoadN) || !sameLoad(maxLoadN, query.maxLoadN)) {
      sentLoads.current = [minLoadN, maxLoadN];
      onChange({ minLoadN, maxLoadN });
    }
  });
  useEffect(() => {
    sendLoads(debouncedMin, debouncedMax);
  }, [debouncedMin, debouncedMax]);

  const minInvalid = parseLoad(minText) === undefined;
  const maxInvalid = parseLoad(maxText) === undefined;
  return (
    <div className="tc-catalog-filters" role="search" aria-label="Filter the catalog">
      <FormGroup label="Search" labelFor="catalog-search" className="tc-catalog-filter tc-catalog-filter--search">
        <InputGroup
          id="catalog-search"
          type="search"
          leftIcon={<SearchIcon />}
          placeholder="Part, series or supplier"
          value={text}
          onChange={(event) => setText(event.target.value)}
        />
      </FormGroup>
      <FormGroup label="Supplier" labelFor="catalog-supplier" className="tc-catalog-filter">
        <HTMLSelect
          id="catalog-supplier"
          fill
          value={query.supplierId === null ? '' : String(query.supplierId)}
          onChange={(event) => onChange({ supplierId: event.target.value ? Number(event.target.value) : null })}
        >
          <option value="">All suppliers</option>
          {suppliers.map((supplier) => (
            <option key={supplier.id} value={supplier.id}>
              {supplier.active ? supplier.name : `${supplier.name} (inactive)`}
            </option>
          ))}
        </HTMLSelect>
      </FormGroup>
      <FormGroup label="Mount types" labelFor="catalog-types" className="tc-catalog-filter tc-catalog-filter--types">
        <MountTypeSelect id="catalog-types" value={query.types} onChange={(types) => onChange({ types })} />
      </FormGroup>
      <FormGroup
        label={`Rated load (${loadUnit})`}
        className="tc-catalog-filter tc-catalog-filter--load"
        helperText={minInvalid || maxInvalid ? 'Enter a number of zero or more.' : undefined}
        intent={minInvalid || maxInvalid ? 'danger' : 'none'}
      >
        <div className="tc-catalog-load-range">
          <InputGroup
            aria-label={`Minimum rated load (${loadUnit})`}
            inputMode="decimal"
            placeholder="min"
            value={minText}
            intent={minInvalid ? 'danger' : 'none'}
            onChange={(event) => setMinText(event.target.value)}
          />
          <span aria-hidden="true">–</span>
          <InputGroup
            aria-label={`Maximum rated load (${loadUnit})`}
            inputMode="decimal"
            placeholder="max"
            value={maxText}
            intent={maxInvalid ? 'danger' : 'none'}
            onChange={(event) => setMaxText(event.target.value)}
          />
        </div>
      </FormGroup>
    </div>
  );
}
