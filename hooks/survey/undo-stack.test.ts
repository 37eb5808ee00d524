import { describe, expect, it } from 'vitest';
import { UNDO_DEPTH, applyUndo, changedFields, combineUndo, popUndo, pushUndo, undoForCreate, undoForRemove, undoForUpdate, type UndoTarget } from './undo-stack';

function recorder(): UndoTarget & { calls: string[] } {
  const calls: string[] = [];
  return {
    calls,
    update: (c, id, f) => { calls.push(`update ${c}/${id} ${JSON.stringify(f)}`); },
    remove: (c, id) => { calls.push(`remove ${c}/${id}`); },
    undelete: (c, id) => { calls.push(`undelete ${c}/${id}`); },
  };
}

describe('survey undo stack (over the sync client’s update/remove/undelete)', () => {
  it('undoing a create removes the record; undoing a delete brings it back', async () => {
    const t = recorder();
    await applyUndo(undoForCreate('Add tree', 'supports', 's1'), t);
    await applyUndo(undoForRemove('Delete tree', 'supports', 's1'), t);
    expect(t.calls).toEqual(['remove supports/s1', 'undelete supports/s1']);
  });

  it('undoing an edit writes back only the fields that changed, with their old values (null for unset)', async () => {
    const before = { heightM: 14, label: 'Oak', species: 'oak' };
    const entry = undoForUpdate('Edit Oak', 'supports', 's1', before, { heightM: 18, label: 'Oak', notes: 'leans' });
    expect(entry?.ops).toEqual([{ op: 'update', collection: 'supports', id: 's1', fields: { heightM: 14, notes: null } }]);
    expect(undoForUpdate('no-op', 'supports', 's1', before, { label: 'Oak' })).toBeNull();
    expect(undoForUpdate('arrays compare by value', 'hazards', 'h1', { points: [{ lat: 1, lon: 2 }] }, { points: [{ lat: 1, lon: 2 }] })).toBeNull();
  });

  it('a combined entry undoes its parts last-first', async () => {
    const t = recorder();
    const entry = combineUndo('Add tree with height', [undoForCreate('a', 'supports', 's1'), null, undoForCreate('b', 'measurements', 'm1')]);
    await applyUndo(entry!, t);
    expect(t.calls).toEqual(['remove measurements/m1', 'remove supports/s1']);
    expect(combineUndo('empty', [null])).toBeNull();
  });

  it('pops the last change first and keeps at most UNDO_DEPTH entries', () => {
    let stack = pushUndo([], undoForCreate('first', 'supports', 'a'));
    stack = pushUndo(stack, undoForCreate('second', 'supports', 'b'));
    expect(popUndo(stack).entry?.label).toBe('second');
    expect(popUndo(popUndo(stack).rest).entry?.label).toBe('first');
    expect(popUndo([]).entry).toBeNull();
    for (let i = 0; i < UNDO_DEPTH + 5; i++) stack = pushUndo(stack, undoForCreate(`n${i}`, 'supports', `x${i}`));
    expect(stack).toHaveLength(UNDO_DEPTH);
    expect(stack[stack.length - 1].label).toBe(`n${UNDO_DEPTH + 4}`);
  });
});

describe('changedFields (an edit writes only what changed)', () => {
  it('keeps changed fields and drops equal ones, comparing arrays by value', () => {
    expect(changedFields({ a: 1, b: [1, 2], c: 'x' }, { a: 2, b: [1, 2], c: 'x', d: null })).toEqual({ a: 2 });
    expect(changedFields({ a: null }, { a: 0 })).toEqual({ a: 0 });
  });
});
