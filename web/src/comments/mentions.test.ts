import { describe, expect, it } from 'vitest';
import { insertMention, matchMembers, mentionQueryAt, mentionsIn } from './mentions';

const members = [
  { id: 'a', name: 'Ana Example' },
  { id: 'b', name: 'Ana Examplesen' },
  { id: 'c', name: 'Boris Sample' },
];

describe('mentions', () => {
  it('mentionQueryAt() finds the @query before the caret, not an e-mail address or a finished line', () => {
    expect(mentionQueryAt('Ask @Bor', 8)).toEqual({ start: 4, query: 'Bor' });
    expect(mentionQueryAt('@', 1)).toEqual({ start: 0, query: '' });
    expect(mentionQueryAt('mail me at x@y.org', 18)).toBeNull();
    expect(mentionQueryAt('@Ana\nnext', 9)).toBeNull();
  });

  it('matchMembers() matches the start of the name or of any word in it', () => {
    expect(matchMembers(members, 'sam').map((m) => m.id)).toEqual(['c']);
    expect(matchMembers(members, 'ana').map((m) => m.id)).toEqual(['a', 'b']);
    expect(matchMembers(members, 'zz')).toEqual([]);
  });

  it('insertMention() replaces the query with the full name and puts the caret after it', () => {
    expect(insertMention('Ask @bo now', { start: 4, query: 'bo' }, members[2]!)).toEqual({ text: 'Ask @Boris Sample  now', caret: 18 });
  });

  it('mentionsIn() takes whole names only, so one name that begins another is not mentioned by it', () => {
    expect(mentionsIn('@Ana Examplesen, see this', members)).toEqual(['b']);
    expect(mentionsIn('@Ana Example and @Boris Sample.', members)).toEqual(['a', 'c']);
    expect(mentionsIn('Ana Example without the at sign', members)).toEqual([]);
  });
});
