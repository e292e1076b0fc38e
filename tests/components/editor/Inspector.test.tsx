import { produce } from 'immer';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { addComponent, connect } from '@/components/editor/document-commands';
import { Inspector } from '@/components/editor/Inspector';
import { componentTypeById } from '@/engine/components/registry';
import { emptyDocument, type CircuitDocument } from '@/engine/document/schema';

// Rendered to markup without a DOM: this checks what the panel shows for a selection; the
// edit logic behind the fields is tested in parameter-form-schema and inspector-commands.

const doc = produce(emptyDocument(), (d) => {
  for (const type of ['valve-5-2', 'cylinder-double-acting', 'relay-coil', 'relay-contact-no']) addComponent(d, type, { x: 0, y: 0 });
  const tube = connect(d, { component: 'valve-5-2-1', port: '4' }, { component: 'cylinder-double-acting-1', port: 'A' });
  if (!tube.ok) throw new Error(tube.reason);
});

const never = () => {
  throw new Error('rendering must not edit the document');
};

function render(selection: { components?: string[]; tubes?: string[]; wires?: string[] }, options: { readOnly?: boolean; document?: CircuitDocument } = {}) {
  return renderToStaticMarkup(
    <Inspector
      document={options.document ?? doc}
      selection={{ components: selection.components ?? [], tubes: selection.tubes ?? [], wires: selection.wires ?? [] }}
      readOnly={options.readOnly ?? false}
      onEdit={never}
    />,
  );
}

const testIds = (markup: string) => [...markup.matchAll(/data-testid="([^"]+)"/g)].map((m) => m[1]);

describe('Inspector', () => {
  it('shows the circuit settings with their units when nothing is selected', () => {
    const markup = render({});
    expect(testIds(markup)).toEqual(['inspector', 'inspector-field-ambient-pressure', 'inspector-field-ambient-temperature']);
    expect(markup).toContain('Ambient pressure<span class="sr-only">, bar (absolute)</span>');
    expect(markup).toContain('°C');
  });

  it('shows a component’s type, tag, label and one field per parameter, numbers with their unit', () => {
    const markup = render({ components: ['valve-5-2-1'] });
    const type = componentTypeById('valve-5-2')!;
    expect(markup).toContain(type.label);
    expect(markup).toContain(type.description);
    expect(testIds(markup)).toEqual(['inspector', 'inspector-tag', 'inspector-label', 'inspector-notes', ...Object.keys(type.parameters).map((name) => `inspector-field-${name}`)]);
    expect(markup).toContain('Pilot switching pressure<span class="sr-only">, bar (gauge)</span>');
    expect(markup).toContain('l/(s·bar)');
    expect(markup).toMatch(/<select[^>]*data-testid="inspector-field-actuation"[^>]*>.*<option value="lever-detent">lever detent<\/option>/);
    expect(markup).toMatch(/<input type="checkbox"[^>]*data-testid="inspector-field-manualOverride"/);
  });

  it('offers the circuit’s coils to a contact, keeping a tag the circuit lacks selectable', () => {
    const markup = render({ components: ['relay-contact-no-1'] });
    expect(markup).toMatch(/data-testid="inspector-field-coil"[^>]*><option value="K1">K1<\/option><\/select>/);
    const renamed = produce(doc, (d) => {
      d.components.find((c) => c.type === 'relay-coil')!.tag = 'K2';
    });
    expect(render({ components: ['relay-contact-no-1'] }, { document: renamed })).toContain('<option value="K1">K1 (not in this circuit)</option><option value="K2">K2</option>');
  });

  it('takes a typed tag where the circuit has nothing to name yet', () => {
    const lone = produce(emptyDocument(), (d) => void addComponent(d, 'solenoid-coil', { x: 0, y: 0 }));
    expect(render({ components: ['solenoid-coil-1'] }, { document: lone })).toMatch(/<input[^>]*type="text"[^>]*data-testid="inspector-field-valve"/);
  });

  it('shows a tube’s length, bore and volume', () => {
    const markup = render({ tubes: ['t1'] });
    expect(testIds(markup)).toEqual(['inspector', 'inspector-field-tube-length', 'inspector-field-tube-inner-diameter', 'inspector-tube-volume']);
    expect(markup).toContain('From 1V1 port 4 to 1A1 port A.');
    // 0.5 m of 4 mm bore: 0.5 · π · 0.004² / 4 = 6.28e-6 m³.
    expect(markup).toContain('6.28 cm³');
  });

  it('counts several selected items', () => {
    expect(render({ components: ['valve-5-2-1', 'relay-coil-1'], tubes: ['t1'] })).toContain('3 items selected');
  });

  it('ignores selected ids the document no longer has', () => {
    expect(render({ components: ['gone', 'valve-5-2-1'] })).toContain('data-testid="inspector-tag"');
  });

  it('disables every field when read-only', () => {
    expect(render({ components: ['valve-5-2-1'] }, { readOnly: true })).toContain('<fieldset disabled=""');
    expect(render({}, { readOnly: true })).toContain('<fieldset disabled=""');
    expect(render({ components: ['valve-5-2-1'] })).not.toContain('disabled=""');
  });
});
