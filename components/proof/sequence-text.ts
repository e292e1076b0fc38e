import type { EndPosition, SequenceActuator, SequenceMotion } from '@/engine/proof/sequence';

/** A time in s as the sequence views print it: milliseconds are the finest step a reader needs. */
export function seconds(t: number): string {
  return t.toFixed(3);
}

function endWord(position: EndPosition): string {
  return position === 'mid' ? 'between its ends' : position === 1 ? 'extended' : 'retracted';
}

/** An action of a step in plain words: "1A1 moves out"; a motion begun in an earlier step says so. */
export function motionText(motion: SequenceMotion): string {
  return `${motion.tag} moves ${motion.direction}${motion.from === 'mid' ? ' (continued)' : ''}`;
}

/** Where an actuator stands in the initial situation: "1A1 retracted". */
export function restText(actuator: SequenceActuator): string {
  return `${actuator.tag} ${endWord(actuator.initial)}`;
}
