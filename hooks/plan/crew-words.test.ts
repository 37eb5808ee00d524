import { describe, expect, it } from 'vitest';
import type { Member, Role } from '@/shared/schemas';
import { crewFirst, crewWords } from './crew-words';

// Common practice of this project (brief s2-crew): members with role crew are listed first in the crew picker,
// since they raise antennas; anyone may still be picked. The card's words must never hide that a crew is named.

const member = (userId: string, displayName: string, role: Role): Member => ({ userId, email: `${displayName.split(' ')[0].toLowerCase()}@kestrel.test`, displayName, callSign: '', role, joinedAt: '2026-11-01T00:00:00.000Z' });
const ray = member('11111111-1111-4111-8111-111111111111', 'Ray Castellano', 'crew');
const ana = member('22222222-2222-4222-8222-222222222222', 'Ana Brook', 'crew');
const priya = member('33333333-3333-4333-8333-333333333333', 'Priya Raman', 'lead');
const dana = member('44444444-4444-4444-8444-444444444444', 'Dana Whitlock', 'admin');

describe('crew picker order and the stations card words', () => {
  it('crew members come first, each group by name; nobody is dropped', () => {
    expect(crewFirst([priya, ray, dana, ana]).map((m) => m.displayName)).toEqual(['Ana Brook', 'Ray Castellano', 'Dana Whitlock', 'Priya Raman']);
  });

  it('no crew named says every crew member gets the sheets', () => {
    expect(crewWords({ crewMemberIds: [] }, [ray])).toBe('Crew: none named (every crew member gets its sheets)');
  });

  it('names the named people; counts the ones the list here does not know; with no list, still says a crew is named', () => {
    expect(crewWords({ crewMemberIds: [ray.userId, priya.userId] }, [ray, priya])).toBe('Crew: Ray Castellano, Priya Raman');
    expect(crewWords({ crewMemberIds: [ray.userId, '55555555-5555-4555-8555-555555555555'] }, [ray])).toBe('Crew: Ray Castellano, 1 more');
    expect(crewWords({ crewMemberIds: [ray.userId, priya.userId] }, undefined)).toBe('Crew: 2 named (member list not on this device)');
  });
});
