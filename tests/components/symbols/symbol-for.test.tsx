import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { DirectionalValveSymbol } from '@/components/symbols/DirectionalValveSymbol';
import { SymbolFor } from '@/components/symbols/SymbolFor';
import { COMPONENT_TYPES, componentTypeById } from '@/engine/components/registry';

const escape = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/** The text drawn beside a port: its number, which the label gives where two ports share one (logic valve inputs). */
const drawnNumber = (port: { id: string; label?: string }) => (port.label && /^\d+$/.test(port.label) ? port.label : port.id);

const count = (markup: string, fragment: string) => markup.split(fragment).length - 1;

const bodyTransform = (markup: string) => /data-part="valve-body" transform="([^"]+)"/.exec(markup)?.[1];

describe('SymbolFor', () => {
  describe.each(COMPONENT_TYPES.map((t) => [t.id, t] as const))('%s', (id, type) => {
    const markup = renderToStaticMarkup(<SymbolFor typeId={id} tag="9X9" />);

    it('draws its own symbol in an svg marked with the type id', () => {
      expect(markup.startsWith('<svg')).toBe(true);
      expect(markup).toContain(`data-symbol="${id}"`);
      expect(markup).not.toContain('data-fallback');
      expect(markup).toMatch(/<(path|rect|circle|line|polygon)\b/);
    });

    it('shows the tag', () => {
      expect(markup).toMatch(/<text data-part="tag"[^>]*>9X9<\/text>/);
    });

    it('numbers every port beside its anchor', () => {
      for (const port of type.ports) {
        expect(markup, port.id).toMatch(new RegExp(`data-port="${escape(port.id)}"[^>]*>${escape(drawnNumber(port))}</text>`));
      }
    });

    it('leaves the numbers off when asked', () => {
      expect(renderToStaticMarkup(<SymbolFor typeId={id} showPortNumbers={false} />)).not.toContain('data-port=');
    });

    it('uses no colour of its own', () => {
      expect(markup).not.toMatch(/#[0-9a-f]{3,6}\b|rgb\(|hsl\(/i);
    });
  });

  describe('directional control valves', () => {
    it('draws one envelope per switching position', () => {
      for (const type of COMPONENT_TYPES.filter((t) => t.positions)) {
        const markup = renderToStaticMarkup(<SymbolFor typeId={type.id} />);
        expect(count(markup, 'data-part="envelope"'), type.id).toBe(type.positions!.length);
      }
    });

    it('draws the passages of each position as arrows and the other ports blocked', () => {
      const markup = renderToStaticMarkup(<SymbolFor typeId="valve-5-3-closed" />);
      const centre = /data-position="centre">(.*?)<\/g><g data-part="envelope"/.exec(markup)?.[1] ?? '';
      expect(count(centre, 'data-blocked=')).toBe(5);
      expect(count(centre, 'data-passage=')).toBe(0);
      const five = renderToStaticMarkup(<SymbolFor typeId="valve-5-2" />);
      expect(count(five, 'data-passage=')).toBe(4);
      expect(five).toContain('data-passage="1-4"');
      expect(five).toContain('data-passage="4-5"');
    });

    it('moves the body so the active position meets the ports', () => {
      const at = (activePosition?: number) => bodyTransform(renderToStaticMarkup(<SymbolFor typeId="valve-5-2" activePosition={activePosition} />));
      expect(at()).toBe('translate(0 0)');
      expect(at(1)).toBe('translate(0 0)');
      expect(at(0)).toBe('translate(40 0)');
      const centred = (activePosition?: number) => bodyTransform(renderToStaticMarkup(<SymbolFor typeId="valve-5-3-exhausted" activePosition={activePosition} />));
      expect([centred(0), centred(1), centred(2)]).toEqual(['translate(40 0)', 'translate(0 0)', 'translate(-40 0)']);
    });

    it('takes the position from the state name too, and ignores a position the valve lacks', () => {
      expect(bodyTransform(renderToStaticMarkup(<SymbolFor typeId="valve-3-2-nc" state="open" />))).toBe('translate(40 0)');
      expect(bodyTransform(renderToStaticMarkup(<SymbolFor typeId="valve-3-2-nc" activePosition={7} />))).toBe('translate(0 0)');
    });

    it('draws the actuation and return its parameters name', () => {
      const solenoid = renderToStaticMarkup(<SymbolFor typeId="valve-5-2" parameters={{ actuation: 'solenoid', returnBy: 'spring' }} />);
      expect(solenoid).toContain('data-mark="solenoid"');
      expect(solenoid).toContain('data-mark="spring"');
      const piloted = renderToStaticMarkup(<SymbolFor typeId="valve-5-2" parameters={{ actuation: 'pilot', returnBy: 'pilot' }} />);
      expect(count(piloted, 'data-mark="pilot"')).toBe(2);
      expect(piloted).not.toContain('data-mark="spring"');
      // A three-position valve is worked from both ends and centred by springs at both.
      const centred = renderToStaticMarkup(<SymbolFor typeId="valve-5-3-closed" parameters={{ actuation: 'solenoid', returnBy: 'spring' }} />);
      expect([count(centred, 'data-mark="solenoid"'), count(centred, 'data-mark="spring"')]).toEqual([2, 2]);
    });

    it('marks the pressure sequence valve’s spring adjustable', () => {
      expect(renderToStaticMarkup(<SymbolFor typeId="pressure-sequence-valve" />)).toContain('data-part="adjustable"');
      expect(renderToStaticMarkup(<SymbolFor typeId="valve-3-2-nc" />)).not.toContain('data-part="adjustable"');
    });
  });

  describe('switching states', () => {
    const blade = (markup: string) => /data-part="blade" data-closed="([^"]+)"/.exec(markup)?.[1];

    it('draws a normally open button open, and closed while pressed', () => {
      expect(blade(renderToStaticMarkup(<SymbolFor typeId="pushbutton-no" />))).toBe('false');
      expect(blade(renderToStaticMarkup(<SymbolFor typeId="pushbutton-no" state="operated" />))).toBe('true');
    });

    it('draws a normally closed button and a struck emergency stop open', () => {
      expect(blade(renderToStaticMarkup(<SymbolFor typeId="pushbutton-nc" />))).toBe('true');
      expect(blade(renderToStaticMarkup(<SymbolFor typeId="pushbutton-nc" state="operated" />))).toBe('false');
      expect(blade(renderToStaticMarkup(<SymbolFor typeId="emergency-stop" state="struck" />))).toBe('false');
    });

    it('draws a relay contact as its own state says', () => {
      expect(blade(renderToStaticMarkup(<SymbolFor typeId="relay-contact-nc" />))).toBe('true');
      expect(blade(renderToStaticMarkup(<SymbolFor typeId="relay-contact-nc" state="open" />))).toBe('false');
      expect(blade(renderToStaticMarkup(<SymbolFor typeId="relay-contact-no" state="closed" />))).toBe('true');
    });

    it('swings a changeover contact from 12 to 14 when worked', () => {
      expect(blade(renderToStaticMarkup(<SymbolFor typeId="limit-switch" />))).toBe('12');
      expect(blade(renderToStaticMarkup(<SymbolFor typeId="limit-switch" state="actuated" />))).toBe('14');
      expect(blade(renderToStaticMarkup(<SymbolFor typeId="pressure-switch" state="operated" />))).toBe('14');
    });

    it('fills coils and lamps only while energised', () => {
      for (const id of ['relay-coil', 'timer-relay-on-delay', 'solenoid-coil', 'counter', 'indicator-lamp']) {
        expect(renderToStaticMarkup(<SymbolFor typeId={id} />), id).not.toContain('fill-opacity="0.25"');
        const lit = renderToStaticMarkup(<SymbolFor typeId={id} energised />);
        expect(lit, id).toMatch(/data-energised="true" [^>]*fill="currentColor" fill-opacity="0.25"/);
      }
    });

    it('moves the shuttle valve’s ball onto the seat of the input not joined', () => {
      const closes = (state?: string) => /data-part="ball" data-closes="(\w+)"/.exec(renderToStaticMarkup(<SymbolFor typeId="shuttle-valve" state={state} />))?.[1];
      expect(closes()).toBe('right');
      expect(closes('1.2 joined')).toBe('left');
    });
  });

  it('marks timer relays by their delay', () => {
    expect(renderToStaticMarkup(<SymbolFor typeId="timer-relay-on-delay" />)).toContain('data-delay="on"');
    expect(renderToStaticMarkup(<SymbolFor typeId="timer-relay-off-delay" />)).toContain('data-delay="off"');
    expect(renderToStaticMarkup(<SymbolFor typeId="relay-coil" />)).not.toContain('data-delay');
  });

  it('moves piston and rod by the share of the stroke a run gives, within the barrel', () => {
    const moving = (extension?: number) => /data-part="moving"(?: transform="translate\(([\d.]+) 0\)")?/.exec(renderToStaticMarkup(<SymbolFor typeId="cylinder-double-acting" extension={extension} />))?.[1];
    expect(moving()).toBeUndefined();
    expect(moving(0)).toBeUndefined();
    expect(Number(moving(0.5))).toBeCloseTo(38, 6);
    expect(Number(moving(1))).toBeCloseTo(76, 6);
    expect(Number(moving(3))).toBeCloseTo(76, 6);
  });

  it('draws a through rod and cushions only when the cylinder has them', () => {
    const plain = renderToStaticMarkup(<SymbolFor typeId="cylinder-double-acting" />);
    expect(plain).not.toContain('second-rod');
    expect(plain).not.toContain('cushions');
    const full = renderToStaticMarkup(<SymbolFor typeId="cylinder-double-acting" parameters={{ throughRod: true, cushionLength: 0.01 }} />);
    expect(full).toContain('data-part="second-rod"');
    expect(full).toContain('data-part="cushions"');
    expect(renderToStaticMarkup(<SymbolFor typeId="cylinder-single-acting" />)).toContain('data-part="spring"');
  });

  it('sizes the svg to the symbol box', () => {
    const markup = renderToStaticMarkup(<SymbolFor typeId="valve-5-3-closed" />);
    expect(markup).toMatch(/^<svg[^>]* width="180" height="60" viewBox="0 0 180 60"/);
  });

  it('stands in for an unknown type with a question mark and its id, without throwing', () => {
    const markup = renderToStaticMarkup(<SymbolFor typeId="valve-9-9" tag="1V9" />);
    expect(componentTypeById('valve-9-9')).toBeUndefined();
    expect(markup).toContain('data-symbol="valve-9-9"');
    expect(markup).toContain('data-fallback="true"');
    expect(markup).toMatch(/>\?<\/text>/);
    expect(markup).toContain('>valve-9-9</text>');
    expect(markup).toContain('>1V9</text>');
  });
});

describe('DirectionalValveSymbol', () => {
  it('joins two ports on one edge with a path that dips into the envelope', () => {
    const markup = renderToStaticMarkup(
      <svg>
        <DirectionalValveSymbol
          positions={[
            { name: 'a', passages: [['3', '5']] },
            { name: 'b', passages: [] },
          ]}
          pilotPorts={['14', '12']}
          actuation="pushbutton"
          returnBy="spring"
        />
      </svg>,
    );
    const path = /data-passage="3-5"><path d="([^"]+)"/.exec(markup)?.[1] ?? '';
    expect(path).toMatch(/^M\S+ 50 V36 H\S+ V/);
    expect(count(markup, 'data-blocked=')).toBe(2);
  });
});
