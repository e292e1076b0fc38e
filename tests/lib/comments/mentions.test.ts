import { describe, expect, it } from 'vitest';
import { mentionedMembers } from '@/lib/comments/mentions';

const MEMBERS = [
  { userId: 'u1', name: 'Priya Natarajan', email: 'p.natarajan@harrowlane.example' },
  { userId: 'u2', name: 'Tom  Okafor', email: 'maintenance-lead@harrowlane.example' },
  { userId: 'u3', name: 'Zoë Brandt', email: 'zb@harrowlane.example' },
];

const ids = (body: string) => mentionedMembers(body, MEMBERS).map((m) => m.userId);

describe('mentionedMembers', () => {
  it('matches the display name without its spaces, in any case', () => {
    expect(ids('@PriyaNatarajan please check the clamp')).toEqual(['u1']);
    expect(ids('@priyanatarajan and @TOMOKAFOR')).toEqual(['u1', 'u2']);
    expect(ids('cc @zoëbrandt')).toEqual(['u3']);
  });

  it("matches the local part of the member's e-mail address", () => {
    expect(ids('@maintenance-lead can you look?')).toEqual(['u2']);
    expect(ids('@P.Natarajan')).toEqual(['u1']);
  });

  it('leaves sentence punctuation after a mention out of the name', () => {
    expect(ids('Thanks @zb.')).toEqual(['u3']);
    expect(ids('(see @TomOkafor), then @PriyaNatarajan!')).toEqual(['u1', 'u2']);
  });

  it('ends the name at a character a name or address part does not have', () => {
    expect(ids('<b>@zb</b>, "@TomOkafor"')).toEqual(['u2', 'u3']);
    expect(ids("@ZoëBrandt's valve")).toEqual(['u3']);
  });

  it('takes an e-mail address, a half name or an unknown name as plain text', () => {
    expect(ids('write to zb@harrowlane.example')).toEqual([]);
    expect(ids('@Priya and @nobody')).toEqual([]);
    expect(ids('no mention at all')).toEqual([]);
  });

  it('names each member once however often they are mentioned', () => {
    expect(ids('@zb @ZoëBrandt @zb')).toEqual(['u3']);
  });
});
