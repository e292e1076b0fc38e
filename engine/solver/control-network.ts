import type { ControlNetwork, RuntimeApi } from '../components/types';

/**
 * Settles at one instant more often than this and the circuit is racing (a relay
 * without delay interrupting its own coil): the network reports it and stops
 * passing changes on at that instant instead of looping.
 */
export const RACE_LIMIT = 200;
/** A load switching more often than this within CHATTER_WINDOW_S is chattering (reported once). */
export const CHATTER_LIMIT = 20;
export const CHATTER_WINDOW_S = 1;

interface Element {
  kind: 'contact' | 'diode';
  a: number;
  b: number;
  closed: boolean;
  owner: string;
  /** Normally-closed contacts that follow a coil open when it operates; `normallyClosed` keeps which they are. */
  normallyClosed: boolean;
  coil?: string;
}

interface Load {
  a: number;
  b: number;
  owner: string;
  name?: string;
  energised: boolean;
  toggles: number[];
  chatterReported: boolean;
}

/**
 * The electrical control circuit as current paths: nets (terminals joined by
 * wires), switching elements (contacts, diodes) between nets, and loads (coils,
 * lamps). A load is energised when one of its nets is reached from a + rail and
 * the other from a 0 V rail through closed contacts — wherever it is drawn, not
 * only on ladder rungs. Loads do not conduct for this search, so two loads in
 * series never energise (each load needs a path of its own to both rails, as on a
 * machine's control panel). A closed path from + to 0 V with no load in it is a
 * short circuit: the supply's protection trips, and every load drops out while it
 * lasts.
 */
export class ControlCircuit implements ControlNetwork {
  private readonly elements: Element[] = [];
  private readonly loads: Load[] = [];
  private readonly plus: number[] = [];
  private readonly zero: number[] = [];
  /** Whether each supply gives power; a supply switched off leaves its rails dead. */
  private readonly powered: boolean[] = [];
  /** The rails of the supplies that give power, the ones a settle starts from. */
  private livePlus: number[] = [];
  private liveZero: number[] = [];
  private readonly tagOf: (componentId: string) => string;
  private netCount = 0;
  private settledAt = Number.NaN;
  private settlesAtInstant = 0;
  private raceReportedAt = Number.NaN;
  private shorted = false;
  /** Nets at + potential after the last settle (none while shorted: the supply has tripped). */
  private live: Uint8Array = new Uint8Array(0);
  /** Owners of contacts that changed since the last drain, so whoever shows contact states reads just those. */
  private changed: string[] = [];
  /** Elements at each net, built at the first settle (the wiring does not change while running). */
  private incident: number[][] | null = null;

  constructor(tagOf: (componentId: string) => string) {
    this.tagOf = tagOf;
  }

  /** Tells the network how many nets the wiring made. */
  useNets(count: number): void {
    this.netCount = count;
  }

  /** The net is connected to + through closed contacts (a live wire on the drawing). */
  netLive(net: number): boolean {
    return this.live[net] === 1;
  }

  get hasSupply(): boolean {
    return this.plus.length > 0;
  }

  addSupply(plusNet: number, zeroNet: number): number {
    this.plus.push(plusNet);
    this.zero.push(zeroNet);
    this.powered.push(true);
    this.pickLiveRails();
    return this.plus.length - 1;
  }

  private pickLiveRails(): void {
    this.livePlus = this.plus.filter((_, i) => this.powered[i]);
    this.liveZero = this.zero.filter((_, i) => this.powered[i]);
  }

  setSupplyPowered(supply: number, powered: boolean, api: RuntimeApi): void {
    if (this.powered[supply] === powered) return;
    this.powered[supply] = powered;
    this.pickLiveRails();
    this.settle(api);
  }

  addContact(a: number, b: number, closed: boolean, owner: string, coil?: string): number {
    this.elements.push({ kind: 'contact', a, b, closed, owner, normallyClosed: closed, ...(coil ? { coil } : {}) });
    return this.elements.length - 1;
  }

  addDiode(anode: number, cathode: number, owner: string): void {
    this.elements.push({ kind: 'diode', a: anode, b: cathode, closed: true, owner, normallyClosed: true });
  }

  addLoad(a: number, b: number, owner: string, name?: string): void {
    this.loads.push({ a, b, owner, ...(name ? { name } : {}), energised: false, toggles: [], chatterReported: false });
  }

  contactClosed(contact: number): boolean {
    return this.elements[contact]!.closed;
  }

  setContacts(changes: ReadonlyArray<readonly [contact: number, closed: boolean]>, api: RuntimeApi): void {
    let changed = false;
    for (const [contact, closed] of changes) {
      const e = this.elements[contact]!;
      if (e.closed === closed) continue;
      e.closed = closed;
      this.changed.push(e.owner);
      changed = true;
    }
    if (changed) this.settle(api);
  }

  operateContacts(coil: string, operated: boolean, api: RuntimeApi): void {
    let changed = false;
    for (const e of this.elements) {
      if (e.coil !== coil) continue;
      const closed = operated ? !e.normallyClosed : e.normallyClosed;
      if (e.closed !== closed) {
        e.closed = closed;
        changed = true;
        this.changed.push(e.owner);
      }
    }
    if (changed) this.settle(api);
  }

  drainChanged(): string[] {
    if (!this.changed.length) return this.changed;
    const changed = this.changed;
    this.changed = [];
    return changed;
  }

  /** Components whose contacts follow `coil`, for diagnostics and the trace. */
  contactsOf(coil: string): string[] {
    return this.elements.filter((e) => e.coil === coil).map((e) => e.owner);
  }

  settle(api: RuntimeApi): void {
    if (!this.hasSupply) return;
    if (api.time === this.settledAt) this.settlesAtInstant += 1;
    else {
      this.settledAt = api.time;
      this.settlesAtInstant = 1;
    }
    if (this.settlesAtInstant > RACE_LIMIT) {
      if (this.raceReportedAt !== api.time) {
        this.raceReportedAt = api.time;
        const involved = this.loads.filter((l) => l.toggles.length && l.toggles[l.toggles.length - 1] === api.time).map((l) => this.tagOf(l.owner));
        api.event('control-race', `the control circuit does not settle at this instant; switching without delay: ${[...new Set(involved)].join(', ')}`);
      }
      return;
    }
    const fromPlus = this.reach(this.livePlus, true);
    const fromZero = this.reach(this.liveZero, false);
    let shorted = false;
    for (let n = 0; n < this.netCount; n += 1) if (fromPlus[n] && fromZero[n]) shorted = true;
    this.live = shorted ? new Uint8Array(this.netCount) : fromPlus;
    if (shorted !== this.shorted) {
      this.shorted = shorted;
      api.event(shorted ? 'short-circuit' : 'short-circuit-cleared', shorted ? 'closed path from + to 0 V without a load: every load drops out' : undefined);
    }
    for (const load of this.loads) {
      const energised = !shorted && ((fromPlus[load.a] === 1 && fromZero[load.b] === 1) || (fromPlus[load.b] === 1 && fromZero[load.a] === 1));
      if (energised === load.energised) continue;
      load.energised = energised;
      this.noteToggle(load, api);
      api.send(load.owner, { action: 'set', value: energised ? 1 : 0, ...(load.name ? { parameter: load.name } : {}) });
    }
  }

  private noteToggle(load: Load, api: RuntimeApi): void {
    load.toggles.push(api.time);
    while (load.toggles.length && load.toggles[0]! < api.time - CHATTER_WINDOW_S) load.toggles.shift();
    if (load.toggles.length > CHATTER_LIMIT && !load.chatterReported) {
      load.chatterReported = true;
      const tag = this.tagOf(load.owner);
      const contacts = this.contactsOf(tag).map((id) => this.tagOf(id));
      api.event('contact-chatter', `${tag} switched ${load.toggles.length} times within ${CHATTER_WINDOW_S} s${contacts.length ? `; its contacts: ${contacts.join(', ')}` : ''}`);
    }
  }

  /** Nets reached from the given rails through closed contacts (diodes: forwards from +, backwards from 0 V). */
  private reach(rails: readonly number[], forward: boolean): Uint8Array {
    const seen = new Uint8Array(this.netCount);
    const stack = [...rails];
    for (const r of rails) seen[r] = 1;
    if (!this.incident) {
      const incident: number[][] = Array.from({ length: this.netCount }, () => []);
      this.elements.forEach((e, i) => {
        incident[e.a]!.push(i);
        if (e.b !== e.a) incident[e.b]!.push(i);
      });
      this.incident = incident;
    }
    while (stack.length) {
      const net = stack.pop()!;
      for (const i of this.incident[net]!) {
        const e = this.elements[i]!;
        if (!e.closed) continue;
        let next = -1;
        if (e.kind === 'contact') next = e.a === net ? e.b : e.b === net ? e.a : -1;
        else if (forward ? e.a === net : e.b === net) next = forward ? e.b : e.a;
        if (next >= 0 && !seen[next]) {
          seen[next] = 1;
          stack.push(next);
        }
      }
    }
    return seen;
  }
}
