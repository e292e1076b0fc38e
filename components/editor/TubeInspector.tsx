'use client';

import { useMemo } from 'react';
import { tubeVolume } from '@/engine/calc/tube';
import type { CircuitDocument, Tube } from '@/engine/document/schema';
import { setTube, TUBE_BORE_LIMITS, TUBE_LENGTH_LIMITS, type DocumentEdit } from './inspector-commands';
import { DecimalField } from './DecimalField';
import { tubeFormSchema, tubeFormValues } from './parameter-form-schema';
import { formatWithUnit, QUANTITY_UNITS } from './quantity-units';
import { useCommittingForm } from './use-committing-form';

/** A volume worked out from two typed sizes: three digits say all it can. */
const VOLUME_DIGITS = 3;

/** One tube: its length and bore, and the volume they add to the circuit. */
export function TubeInspector({ document, tube, readOnly, onEdit }: { document: CircuitDocument; tube: Tube; readOnly: boolean; onEdit: DocumentEdit }) {
  const values = useMemo(() => tubeFormValues(tube), [tube]);
  const form = useCommittingForm(tubeFormSchema, values, readOnly);
  const tagOf = (componentId: string) => document.components.find((c) => c.id === componentId)?.tag ?? componentId;

  return (
    <form onSubmit={(event) => event.preventDefault()} noValidate aria-label="Tube">
      <header className="mb-3">
        <h2 className="text-sm font-semibold text-ink">Tube</h2>
        <p className="mt-0.5 text-xs text-ink-soft">
          From {tagOf(tube.from.component)} port {tube.from.port} to {tagOf(tube.to.component)} port {tube.to.port}.
        </p>
      </header>
      <fieldset disabled={readOnly} className="space-y-3">
        <DecimalField
          form={form}
          path="length"
          name="tube-length"
          label="Length"
          unit={TUBE_LENGTH_LIMITS.unit.unit}
          target={{
            schema: tubeFormSchema.shape.length,
            current: tube.lengthM,
            apply: (lengthM) => onEdit('Set tube length', (draft) => setTube(draft, tube.id, { lengthM })),
          }}
        />
        <DecimalField
          form={form}
          path="innerDiameter"
          name="tube-inner-diameter"
          label="Inner diameter"
          unit={TUBE_BORE_LIMITS.unit.unit}
          target={{
            schema: tubeFormSchema.shape.innerDiameter,
            current: tube.innerDiameterM,
            apply: (innerDiameterM) => onEdit('Set tube inner diameter', (draft) => setTube(draft, tube.id, { innerDiameterM })),
          }}
        />
      </fieldset>
      <p className="mt-3 text-sm text-ink-soft">
        Volume <output className="value" data-testid="inspector-tube-volume">{formatWithUnit(tubeVolume(tube.lengthM, tube.innerDiameterM), QUANTITY_UNITS.volume, VOLUME_DIGITS)}</output>
      </p>
    </form>
  );
}
