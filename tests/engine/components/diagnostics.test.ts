import { describe, expect, it } from 'vitest';
import { compile, type CompileResult } from '@/engine/solver/compile';
import { TestCircuit } from '../support/circuit';

/** Compiles without letting an exception escape unnoticed. */
function compileSafely(build: () => ReturnType<TestCircuit['build']>): CompileResult {
  let result: CompileResult | undefined;
  expect(() => {
    result = compile(build());
  }).not.toThrow();
  return result!;
}

function expectError(result: CompileResult, code: string, where: { componentId?: string; tubeId?: string }): void {
  expect(result.model).toBeNull();
  const found = result.diagnostics.find((d) => d.code === code);
  expect(found, `diagnostics: ${JSON.stringify(result.diagnostics)}`).toBeDefined();
  expect(found!.severity).toBe('error');
  expect(found!.message.length).toBeGreaterThan(0);
  expect(found).toMatchObject(where);
}

const base = () => new TestCircuit().add('sup', 'air-supply').add('v', 'valve-3-2-nc').tube('sup:2', 'v:1');

describe('compile diagnostics', () => {
  it('a sound circuit compiles to a model without errors', () => {
    const result = compileSafely(() => base().build());
    expect(result.model).not.toBeNull();
    expect(result.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
  });

  it('unknown component type → unknown-component-type', () => {
    const result = compileSafely(() => base().add('zz', 'warp-drive').build());
    expectError(result, 'unknown-component-type', { componentId: 'zz' });
  });

  it('tube to a port the component does not have → tube-unknown-port', () => {
    const result = compileSafely(() => base().add('g', 'pressure-gauge').tube('v:7', 'g:1').build());
    expectError(result, 'tube-unknown-port', { tubeId: 't1' });
  });

  it('tube to a component that does not exist → tube-unknown-port', () => {
    const result = compileSafely(() => base().tube('v:2', 'ghost:1').build());
    expectError(result, 'tube-unknown-port', { tubeId: 't1' });
  });

  const badValues: Array<[string, string, Record<string, number | string | boolean>]> = [
    ['a number above its maximum', 'throttle', { opening: 1.5 }],
    ['a number below its minimum', 'air-supply', { pressure: -1 }],
    ['a number given as text', 'throttle', { opening: 'half' }],
    ['a choice not in its list', 'valve-5-2', { actuation: 'telepathy' }],
    ['a flag given as a number', 'pressure-regulator', { relieving: 1 }],
  ];
  for (const [what, type, parameters] of badValues) {
    it(`bad parameter value (${what}) → bad-parameter`, () => {
      const result = compileSafely(() => base().add('bp', type, parameters).build());
      expectError(result, 'bad-parameter', { componentId: 'bp' });
    });
  }
});
