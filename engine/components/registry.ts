import { counter } from './counter';
import { dcSupply } from './dc-supply';
import { diode } from './diode';
import { emergencyStop } from './emergency-stop';
import { indicatorLamp } from './indicator-lamp';
import { limitSwitch } from './limit-switch';
import { pressureSwitch } from './pressure-switch';
import { proximitySensorInductive } from './proximity-sensor-inductive';
import { proximitySensorReed } from './proximity-sensor-reed';
import { pushbuttonNc } from './pushbutton-nc';
import { pushbuttonNo } from './pushbutton-no';
import { relayCoil } from './relay-coil';
import { relayContactNc } from './relay-contact-nc';
import { relayContactNo } from './relay-contact-no';
import { selectorSwitch } from './selector-switch';
import { solenoidCoil } from './solenoid-coil';
import { timerRelayOffDelay } from './timer-relay-off-delay';
import { timerRelayOnDelay } from './timer-relay-on-delay';
import { airSupply } from './air-supply';
import { checkValve } from './check-valve';
import { cylinderDoubleActing } from './cylinder-double-acting';
import { cylinderSingleActing } from './cylinder-single-acting';
import { filter } from './filter';
import { lubricator } from './lubricator';
import { oneWayFlowControl } from './one-way-flow-control';
import { pressureGauge } from './pressure-gauge';
import { pressureRegulator } from './pressure-regulator';
import { pressureSequenceValve } from './pressure-sequence-valve';
import { quickExhaustValve } from './quick-exhaust-valve';
import { reservoir } from './reservoir';
import { semiRotaryActuator } from './semi-rotary-actuator';
import { shutOffValve } from './shut-off-valve';
import { shuttleValve } from './shuttle-valve';
import { silencer } from './silencer';
import { throttle } from './throttle';
import { timeDelayValveNc } from './time-delay-valve-nc';
import { timeDelayValveNo } from './time-delay-valve-no';
import { twoPressureValve } from './two-pressure-valve';
import type { ComponentType } from './types';
import { valve22 } from './valve-2-2';
import { valve32Nc } from './valve-3-2-nc';
import { valve32No } from './valve-3-2-no';
import { valve42 } from './valve-4-2';
import { valve52 } from './valve-5-2';
import { valve53Closed } from './valve-5-3-closed';
import { valve53Exhausted } from './valve-5-3-exhausted';
import { valve53Pressurised } from './valve-5-3-pressurised';

/** Every component type, in palette order. Adding a type: one file, one line here. */
export const COMPONENT_TYPES: readonly ComponentType[] = [
  airSupply,
  filter,
  pressureRegulator,
  lubricator,
  shutOffValve,
  reservoir,
  silencer,
  pressureGauge,
  valve22,
  valve32Nc,
  valve32No,
  valve42,
  valve52,
  valve53Closed,
  valve53Exhausted,
  valve53Pressurised,
  twoPressureValve,
  shuttleValve,
  checkValve,
  throttle,
  oneWayFlowControl,
  quickExhaustValve,
  pressureSequenceValve,
  timeDelayValveNc,
  timeDelayValveNo,
  cylinderSingleActing,
  cylinderDoubleActing,
  semiRotaryActuator,
  dcSupply,
  pushbuttonNo,
  pushbuttonNc,
  selectorSwitch,
  emergencyStop,
  limitSwitch,
  proximitySensorReed,
  proximitySensorInductive,
  pressureSwitch,
  relayCoil,
  timerRelayOnDelay,
  timerRelayOffDelay,
  counter,
  relayContactNo,
  relayContactNc,
  solenoidCoil,
  indicatorLamp,
  diode,
];

const byId = new Map(COMPONENT_TYPES.map((t) => [t.id, t]));

export function componentTypeById(id: string): ComponentType | undefined {
  return byId.get(id);
}
