import { componentTypeById } from '@/engine/components/registry';
import { parameterDefaults, type HandOperation, type InputAction } from '@/engine/components/types';
import type { CircuitComponent } from '@/engine/document/schema';

/** How a placed part is worked by hand during a run, as its type says (null: not by hand). */
export function handOperationOf(component: CircuitComponent): HandOperation | null {
  const type = componentTypeById(component.type);
  return type?.handOperation?.({ ...parameterDefaults(type), ...component.parameters }) ?? null;
}

/**
 * The hands on a running drawing: which buttons are held down, and which are kept pressed
 * (Shift+click, so that both buttons of a two-hand start can be held with one mouse). Turns a
 * pointer going down on or up from a part into the input the part gets, if any.
 */
export class Hands {
  private readonly pressed = new Set<string>();
  private readonly kept = new Set<string>();

  /** `struck`: an emergency stop that is struck now (so the next push resets it). */
  input(componentId: string, operation: HandOperation, phase: 'down' | 'up', keep: boolean, struck: boolean): InputAction | null {
    if (operation === 'switch') return phase === 'down' ? 'toggle' : null;
    if (operation === 'strike') return phase === 'down' ? (struck ? 'toggle' : 'press') : null;
    if (phase === 'down' && keep) {
      if (this.kept.delete(componentId)) {
        this.pressed.delete(componentId);
        return 'release';
      }
      if (this.pressed.has(componentId)) return null;
      this.kept.add(componentId);
      this.pressed.add(componentId);
      return 'press';
    }
    if (phase === 'down') {
      if (this.pressed.has(componentId)) return null;
      this.pressed.add(componentId);
      return 'press';
    }
    // Up (or the pointer leaving the part): a kept button stays down.
    return !this.kept.has(componentId) && this.pressed.delete(componentId) ? 'release' : null;
  }

  /** The run stopped: every hand lets go. */
  clear(): void {
    this.pressed.clear();
    this.kept.clear();
  }
}
