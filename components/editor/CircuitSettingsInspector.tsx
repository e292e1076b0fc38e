'use client';

import { useMemo } from 'react';
import type { CircuitDocument } from '@/engine/document/schema';
import { AMBIENT_PRESSURE_LIMITS, AMBIENT_TEMPERATURE_LIMITS, setSettings, type DocumentEdit } from './inspector-commands';
import { DecimalField } from './DecimalField';
import { settingsFormSchema, settingsFormValues } from './parameter-form-schema';
import { useCommittingForm } from './use-committing-form';

/** With nothing selected: the conditions the whole circuit runs in. */
export function CircuitSettingsInspector({ settings, readOnly, onEdit }: { settings: CircuitDocument['settings']; readOnly: boolean; onEdit: DocumentEdit }) {
  const values = useMemo(() => settingsFormValues(settings), [settings]);
  const form = useCommittingForm(settingsFormSchema, values, readOnly);

  return (
    <form onSubmit={(event) => event.preventDefault()} noValidate aria-label="Circuit settings">
      <header className="mb-3">
        <h2 className="text-sm font-semibold text-ink">Circuit settings</h2>
        <p className="mt-0.5 text-xs text-ink-soft">Select a part or a tube on the drawing to edit it. These settings apply to the whole circuit.</p>
      </header>
      <fieldset disabled={readOnly} className="space-y-3">
        <DecimalField
          form={form}
          path="ambientPressure"
          name="ambient-pressure"
          label="Ambient pressure"
          unit={AMBIENT_PRESSURE_LIMITS.unit.unit}
          hint="Gauge pressures in the circuit are measured from this."
          target={{
            schema: settingsFormSchema.shape.ambientPressure,
            current: settings.ambientPressurePa,
            apply: (ambientPressurePa) => onEdit('Set ambient pressure', (draft) => setSettings(draft, { ambientPressurePa })),
          }}
        />
        <DecimalField
          form={form}
          path="ambientTemperature"
          name="ambient-temperature"
          label="Ambient temperature"
          unit={AMBIENT_TEMPERATURE_LIMITS.unit.unit}
          target={{
            schema: settingsFormSchema.shape.ambientTemperature,
            current: settings.ambientTemperatureK,
            apply: (ambientTemperatureK) => onEdit('Set ambient temperature', (draft) => setSettings(draft, { ambientTemperatureK })),
          }}
        />
      </fieldset>
    </form>
  );
}
