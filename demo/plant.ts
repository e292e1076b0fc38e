import type { ColumnMapping } from '@/lib/field-logs';
import type { Role } from '@/models/roles';

/**
 * The demo workspace: a fictional plant and machine. Every name here is invented;
 * the passwords are published in the README and are for local use only.
 */
export const DEMO_PASSWORD = 'harrowlane-demo';

export const DEMO_WORKSPACE = { name: 'Harrow Lane Packaging Works — Lid press cell LP-2', slug: 'harrow-lane-lp2' };

export const DEMO_USERS: ReadonlyArray<{ email: string; name: string; role: Role }> = [
  { email: 'owner@harrowlane.example', name: 'Olwen Marsh', role: 'owner' },
  { email: 'engineer@harrowlane.example', name: 'Emeka Lund', role: 'engineer' },
  { email: 'reviewer@harrowlane.example', name: 'Rhea Castell', role: 'reviewer' },
  { email: 'technician@harrowlane.example', name: 'Tobiah Wren', role: 'technician' },
  { email: 'viewer@harrowlane.example', name: 'Vida Okafor', role: 'viewer' },
];

export const DEMO_CIRCUITS: ReadonlyArray<{ file: string; title: string; description: string; author: Role }> = [
  {
    file: 'lid-press-two-hand.json',
    title: 'Lid press — two-hand start',
    description: 'Two 3/2 push-button valves into a two-pressure valve pilot the 5/2 main valve; meter-out speed control on extension.',
    author: 'engineer',
  },
  {
    file: 'carton-clamp-sequence.json',
    title: 'Carton clamp — pilot return by roller',
    description: 'Start button pilots the clamp out; a roller valve at the end of stroke pilots it back.',
    author: 'engineer',
  },
  {
    file: 'reject-gate-quick-exhaust.json',
    title: 'Reject gate — single-acting with quick exhaust',
    description: 'Spring-return gate cylinder; a quick exhaust valve shortens the return stroke.',
    author: 'owner',
  },
  {
    file: 'lid-press-relay-control.json',
    title: 'Lid press — relay control, 24 V DC',
    description: 'The press on a single-solenoid 5/2 valve: start and stop buttons latch K1, reed sensor 1B2 at the bottom starts dwell timer KT1, which ends the cycle; emergency stop S0 feeds every rung.',
    author: 'engineer',
  },
  {
    file: 'lid-press-two-hand-timed.json',
    title: 'Lid press — timed two-hand start, 24 V DC',
    description:
      'S1 and S2 drive relays K1 and K2; either starts the 0.5 s window timer KT1. K3 picks up only through K1, K2 and the NC contact of KT1, so both hands within 0.5 s (ISO 13851 synchronous actuation), and holds itself while both stay pressed; a new stroke needs both released first. K3 drives solenoid 1M1 of the spring-return 5/2 valve.',
    author: 'engineer',
  },
];

/**
 * Field logs uploaded to the demo circuits, with the mapping saved for each (demo/logs). The lid
 * press log was recorded with the meter-out flow control 1V2 closed too far, so the lid is slow down.
 */
export const DEMO_LOGS: ReadonlyArray<{ file: string; circuitTitle: string; uploader: Role; mappingName: string; mapping: ColumnMapping }> = [
  {
    file: 'lid-press-slow-close.csv',
    circuitTitle: 'Lid press — relay control, 24 V DC',
    uploader: 'technician',
    mappingName: 'LP-2 data logger, channels 1–5',
    mapping: {
      time: { column: 'timestamp', format: 'iso8601' },
      columns: [
        { column: 'S1_start', tag: 'S1', word: 'pressed', role: 'command' },
        { column: 'S2_stop', tag: '', word: '', role: 'ignore' },
        { column: '1M1_valve', tag: '1M1', word: 'energised', role: 'observation' },
        { column: '1B2_down', tag: '1B2', word: 'on', role: 'observation' },
        { column: 'p_cap_bar', tag: '1A1', word: 'pressure:A', role: 'observation', unit: 'bar-gauge' },
      ],
    },
  },
];
