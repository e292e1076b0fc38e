'use client';

import { useState } from 'react';
import { FormAlert } from '@/components/forms/FormAlert';
import { Button } from '@/components/ui/Button';
import { useCan } from '@/components/workspace/use-current-workspace';
import { CircuitsHeading } from './CircuitsHeading';
import { CircuitTable } from './CircuitTable';
import { NewCircuitForm, type CreatedCircuit } from './NewCircuitForm';

export function CircuitsView() {
  const canCreate = useCan('circuit:create');
  const [formOpen, setFormOpen] = useState(false);
  const [created, setCreated] = useState<CreatedCircuit | null>(null);

  return (
    <div className="space-y-6">
      <CircuitsHeading
        action={
          canCreate && !formOpen ? (
            <Button
              variant="primary"
              onClick={() => {
                setCreated(null);
                setFormOpen(true);
              }}
              data-testid="new-circuit"
            >
              New circuit
            </Button>
          ) : null
        }
      />

      {canCreate && formOpen ? (
        <NewCircuitForm
          onCancel={() => setFormOpen(false)}
          onCreated={(circuit) => {
            setFormOpen(false);
            setCreated(circuit);
          }}
        />
      ) : null}

      {created ? (
        <FormAlert tone="success">
          Circuit <strong className="font-semibold">{created.title}</strong> created as revision{' '}
          <span className="value">{created.revision.number}</span>.
        </FormAlert>
      ) : null}

      <CircuitTable />
    </div>
  );
}
