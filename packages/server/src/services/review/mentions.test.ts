import { describe, expect, it } from 'vitest';
import { findMentions, type Mentionable } from './mentions';

const members: Mentionable[] = [
  { id: 'u1', name: 'Chandra Patel', email: 'checker@demo.sheaf.test' },
  { id: 'u2', name: 'Eamon Reyes', email: 'engineer@demo.sheaf.test' },
  { id: 'u3', name: 'Eamon Walsh', email: 'ewalsh@demo.sheaf.test' },
  { id: 'u4', name: 'Chandrasekhar Rao', email: 'rao@demo.sheaf.test' },
];

const ids = (body: string) => findMentions(body, members).map((m) => m.id);

describe('findMentions', () => {
  it('finds members by full name, unique first name or mailbox name, in any case', () => {
    expect(ids('@Chandra Patel please check the weld throat')).toEqual(['u1']);
    expect(ids('@chandra see above')).toEqual(['u1']);
    expect(ids('cc @checker and @ENGINEER.')).toEqual(['u1', 'u2']);
  });

  it('tells a name from a longer one and refuses a first name two members share', () => {
    expect(ids('@Chandrasekhar Rao, over to you')).toEqual(['u4']);
    expect(ids('@Chandrasekhar')).toEqual(['u4']);
    expect(ids('@Eamon can you look')).toEqual([]);
    expect(ids('@Eamon Walsh can you look')).toEqual(['u3']);
  });

  it('ignores e-mail addresses and names each member once', () => {
    expect(ids('send it to rao@demo.sheaf.test')).toEqual([]);
    expect(ids('@rao and again @Chandrasekhar Rao')).toEqual(['u4']);
  });
});
