/** A member who can be named in a note. */
export interface Mentionable {
  id: string;
  name: string;
  email: string;
}

/**
 * Members named in a note with `@`: by full name (`@Chandra Patel`), by first name when only one
 * member has it (`@Chandra`), or by the part of their e-mail address before the `@`
 * (`@checker`). Case does not matter; the name must end at a space, punctuation or the end of
 * the text, so `@Chandra` does not match `@Chandrasekhar`. Longer names win over their prefixes.
 */
export function findMentions(body: string, members: readonly Mentionable[]): Mentionable[] {
  const handles = new Map<string, Mentionable | null>();
  const claim = (handle: string, member: Mentionable) => {
    const key = handle.trim().toLowerCase();
    if (key === '') return;
    const holder = handles.get(key);
    // A handle two members share names nobody: the writer must be more specific.
    handles.set(key, holder === undefined || holder?.id === member.id ? member : null);
  };
  for (const member of members) {
    claim(member.name, member);
    claim(member.email.split('@')[0] ?? '', member);
  }
  const firstNames = new Map<string, Mentionable[]>();
  for (const member of members) {
    const first = member.name.trim().split(/\s+/)[0]?.toLowerCase();
    if (first) firstNames.set(first, [...(firstNames.get(first) ?? []), member]);
  }
  for (const [first, holders] of firstNames) if (holders.length === 1 && !handles.has(first)) handles.set(first, holders[0]!);

  const sorted = [...handles.entries()].filter((entry): entry is [string, Mentionable] => entry[1] !== null).sort((a, b) => b[0].length - a[0].length);
  const text = body.toLowerCase();
  const found = new Map<string, Mentionable>();
  for (let at = text.indexOf('@'); at >= 0; at = text.indexOf('@', at + 1)) {
    // An address such as name@example.com is not a mention.
    if (at > 0 && /[\p{L}\p{N}._-]/u.test(text[at - 1]!)) continue;
    const rest = text.slice(at + 1);
    const match = sorted.find(([handle]) => rest.startsWith(handle) && !/^[\p{L}\p{N}_-]/u.test(rest.slice(handle.length)));
    if (match) found.set(match[1].id, match[1]);
  }
  return [...found.values()];
}
