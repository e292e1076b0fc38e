import type { ReactNode } from 'react';
import type { ComponentType, ParameterValues } from '@/engine/components/types';
import { AirSupplySymbol } from './AirSupplySymbol';
import { CheckValveSymbol } from './CheckValveSymbol';
import { CoilSymbol } from './CoilSymbol';
import type { ContactOperatorKind } from './ContactOperator';
import { ContactSymbol } from './ContactSymbol';
import { CounterSymbol } from './CounterSymbol';
import { CylinderSymbol } from './CylinderSymbol';
import { DcSupplySymbol } from './DcSupplySymbol';
import { DiodeSymbol } from './DiodeSymbol';
import { DirectionalValveSymbol } from './DirectionalValveSymbol';
import { FilterSymbol } from './FilterSymbol';
import { IndicatorLampSymbol } from './IndicatorLampSymbol';
import { LimitSwitchSymbol } from './LimitSwitchSymbol';
import { LubricatorSymbol } from './LubricatorSymbol';
import { OneWayFlowControlSymbol } from './OneWayFlowControlSymbol';
import { PressureGaugeSymbol } from './PressureGaugeSymbol';
import { PressureRegulatorSymbol } from './PressureRegulatorSymbol';
import { PressureSequenceValveSymbol } from './PressureSequenceValveSymbol';
import { PressureSwitchSymbol } from './PressureSwitchSymbol';
import { ProximitySensorSymbol } from './ProximitySensorSymbol';
import { QuickExhaustValveSymbol } from './QuickExhaustValveSymbol';
import { ReservoirSymbol } from './ReservoirSymbol';
import { SemiRotaryActuatorSymbol } from './SemiRotaryActuatorSymbol';
import { ShuttleValveSymbol } from './ShuttleValveSymbol';
import { SilencerSymbol } from './SilencerSymbol';
import { ThrottleSymbol } from './ThrottleSymbol';
import { TimeDelayValveSymbol } from './TimeDelayValveSymbol';
import { TwoPressureValveSymbol } from './TwoPressureValveSymbol';
import type { ShownState } from './symbol-props';

/** What the canvas knows about one placed component, handed to its drawing. */
export interface DrawingRequest extends ShownState {
  type: ComponentType;
  /** The component's parameters over the type's defaults. */
  parameters: ParameterValues;
}

/** Draws one type; null when the type lacks what its drawing needs, so the caller falls back. */
type Drawing = (request: DrawingRequest) => ReactNode;

/** The states in which a switch's operator is worked, by the names the types give them. */
const WORKED_STATES = new Set(['operated', 'struck', 'actuated']);
const worked = (request: DrawingRequest) => request.state !== undefined && WORKED_STATES.has(request.state);

const labels = ({ tag, showPortNumbers }: DrawingRequest) => ({ tag, showPortNumbers });

/** A valve's position by `activePosition`, else by its state's name (the types name positions as states). */
const positionOf = ({ activePosition, state, type }: DrawingRequest) => activePosition ?? (state === undefined ? undefined : type.states.indexOf(state));

function valve(Drawn: typeof DirectionalValveSymbol): Drawing {
  return function drawValve(request) {
    const { positions, pilotPorts } = request.type;
    if (!positions || !pilotPorts) return null;
    return (
      <Drawn
        positions={positions}
        pilotPorts={pilotPorts}
        actuation={String(request.parameters.actuation)}
        returnBy={String(request.parameters.returnBy)}
        activePosition={positionOf(request)}
        {...labels(request)}
      />
    );
  };
}

const terminalsOf = (type: ComponentType) => [type.ports[0]!.id, type.ports[1]!.id] as const;

function manualContact(normallyClosed: boolean, operator: ContactOperatorKind, latching = false): Drawing {
  return function drawManualContact(request) {
    return (
      <ContactSymbol
        terminals={terminalsOf(request.type)}
        normallyClosed={normallyClosed}
        closed={worked(request) !== normallyClosed}
        operator={operator}
        latching={latching}
        {...labels(request)}
      />
    );
  };
}

// A relay contact's states name the contact itself (open, closed), not its operator.
function relayContact(normallyClosed: boolean): Drawing {
  return function drawRelayContact(request) {
    return (
      <ContactSymbol
        terminals={terminalsOf(request.type)}
        normallyClosed={normallyClosed}
        closed={request.state === undefined ? normallyClosed : request.state === 'closed'}
        {...labels(request)}
      />
    );
  };
}

const joinedInput = (request: DrawingRequest) => (request.state === '1.2 joined' ? '1.2' : '1.1');

/** Every registry type's drawing, by type id. */
export const DRAWINGS: Readonly<Record<string, Drawing>> = {
  'air-supply': (r) => <AirSupplySymbol {...labels(r)} />,
  filter: (r) => <FilterSymbol {...labels(r)} />,
  'pressure-regulator': (r) => <PressureRegulatorSymbol {...labels(r)} />,
  lubricator: (r) => <LubricatorSymbol {...labels(r)} />,
  'shut-off-valve': valve(DirectionalValveSymbol),
  reservoir: (r) => <ReservoirSymbol {...labels(r)} />,
  silencer: (r) => <SilencerSymbol {...labels(r)} />,
  'pressure-gauge': (r) => <PressureGaugeSymbol {...labels(r)} />,
  'valve-2-2': valve(DirectionalValveSymbol),
  'valve-3-2-nc': valve(DirectionalValveSymbol),
  'valve-3-2-no': valve(DirectionalValveSymbol),
  'valve-4-2': valve(DirectionalValveSymbol),
  'valve-5-2': valve(DirectionalValveSymbol),
  'valve-5-3-closed': valve(DirectionalValveSymbol),
  'valve-5-3-exhausted': valve(DirectionalValveSymbol),
  'valve-5-3-pressurised': valve(DirectionalValveSymbol),
  'two-pressure-valve': (r) => <TwoPressureValveSymbol joined={joinedInput(r)} {...labels(r)} />,
  'shuttle-valve': (r) => <ShuttleValveSymbol joined={joinedInput(r)} {...labels(r)} />,
  'check-valve': (r) => <CheckValveSymbol {...labels(r)} />,
  throttle: (r) => <ThrottleSymbol {...labels(r)} />,
  'one-way-flow-control': (r) => <OneWayFlowControlSymbol {...labels(r)} />,
  'quick-exhaust-valve': (r) => <QuickExhaustValveSymbol exhausting={r.state === 'exhausting'} {...labels(r)} />,
  'pressure-sequence-valve': valve(PressureSequenceValveSymbol),
  'time-delay-valve-nc': valve(TimeDelayValveSymbol),
  'time-delay-valve-no': valve(TimeDelayValveSymbol),
  'cylinder-single-acting': (r) => <CylinderSymbol acting="single" extension={r.extension} {...labels(r)} />,
  'cylinder-double-acting': (r) => (
    <CylinderSymbol
      acting="double"
      throughRod={r.parameters.throughRod === true}
      cushioned={Number(r.parameters.cushionLength) > 0}
      extension={r.extension}
      {...labels(r)}
    />
  ),
  'semi-rotary-actuator': (r) => <SemiRotaryActuatorSymbol {...labels(r)} />,
  'dc-supply': (r) => <DcSupplySymbol voltage={typeof r.parameters.voltage === 'number' ? r.parameters.voltage : undefined} {...labels(r)} />,
  'pushbutton-no': manualContact(false, 'pushbutton'),
  'pushbutton-nc': manualContact(true, 'pushbutton'),
  'selector-switch': manualContact(false, 'selector', true),
  'emergency-stop': manualContact(true, 'mushroom', true),
  'limit-switch': (r) => <LimitSwitchSymbol actuated={worked(r)} {...labels(r)} />,
  'proximity-sensor-reed': (r) => <ProximitySensorSymbol sensing="magnetic" detecting={worked(r)} {...labels(r)} />,
  'proximity-sensor-inductive': (r) => <ProximitySensorSymbol sensing="inductive" detecting={worked(r)} {...labels(r)} />,
  'pressure-switch': (r) => <PressureSwitchSymbol actuated={worked(r)} {...labels(r)} />,
  'relay-coil': (r) => <CoilSymbol energised={r.energised} {...labels(r)} />,
  'timer-relay-on-delay': (r) => <CoilSymbol delay="on" energised={r.energised} {...labels(r)} />,
  'timer-relay-off-delay': (r) => <CoilSymbol delay="off" energised={r.energised} {...labels(r)} />,
  counter: (r) => <CounterSymbol energised={r.energised} {...labels(r)} />,
  'relay-contact-no': relayContact(false),
  'relay-contact-nc': relayContact(true),
  'solenoid-coil': (r) => <CoilSymbol solenoid energised={r.energised} {...labels(r)} />,
  'indicator-lamp': (r) => <IndicatorLampSymbol energised={r.energised} {...labels(r)} />,
  diode: (r) => <DiodeSymbol {...labels(r)} />,
};
