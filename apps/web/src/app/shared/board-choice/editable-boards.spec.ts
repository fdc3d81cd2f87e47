import { describe, expect, it } from 'vitest';
import type { BoardSummary } from '@barwright/contracts';
import { editableBoards } from './editable-boards';

const board = (name: string, role: BoardSummary['role'], archived = false): BoardSummary => ({ id: name, name, role, archived, ownerName: 'x', designCount: 0, updatedAt: '' });

describe('editableBoards', () => {
  it('offers the boards where the member is owner or editor, own first, by name', () => {
    const lists = {
      mine: [board('Zinc', 'owner'), board('Acorn', 'owner'), board('Old', 'owner', true)],
      shared: [board('Guild', 'editor'), board('Peek', 'viewer')],
    };
    expect(editableBoards(lists).map((b) => b.name)).toEqual(['Acorn', 'Zinc', 'Guild']);
  });
});
