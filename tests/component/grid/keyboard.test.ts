/**
 * Key presses to grid commands. The bindings follow the common practice of
 * spreadsheet programs and of the WAI-ARIA Authoring Practices grid pattern
 * (arrows, Home/End, Ctrl+Home/End, PageUp/PageDown, Enter/F2 to edit).
 */
import { describe, expect, it } from 'vitest';
import { commandForKey, editorCommandForKey, RESIZE_STEP_PX } from '../../../src/app/grid/index.ts';
import type { KeyInput } from '../../../src/app/grid/index.ts';

describe('commandForKey', () => {
  it.each<[string, KeyInput, unknown]>([
    ['ArrowDown', { key: 'ArrowDown' }, { type: 'move', rows: 1, cols: 0, extend: false }],
    ['ArrowLeft', { key: 'ArrowLeft' }, { type: 'move', rows: 0, cols: -1, extend: false }],
    ['Shift+ArrowDown', { key: 'ArrowDown', shiftKey: true }, { type: 'move', rows: 1, cols: 0, extend: true }],
    ['Shift+ArrowRight', { key: 'ArrowRight', shiftKey: true }, { type: 'move', rows: 0, cols: 1, extend: true }],
    ['Tab', { key: 'Tab' }, { type: 'tab', backwards: false }],
    ['Shift+Tab', { key: 'Tab', shiftKey: true }, { type: 'tab', backwards: true }],
    ['Home', { key: 'Home' }, { type: 'moveTo', target: 'rowStart', extend: false }],
    ['End', { key: 'End' }, { type: 'moveTo', target: 'rowEnd', extend: false }],
    ['Ctrl+Home', { key: 'Home', ctrlKey: true }, { type: 'moveTo', target: 'gridStart', extend: false }],
    ['Cmd+End', { key: 'End', metaKey: true }, { type: 'moveTo', target: 'gridEnd', extend: false }],
    ['Ctrl+ArrowDown', { key: 'ArrowDown', ctrlKey: true }, { type: 'moveTo', target: 'colEnd', extend: false }],
    [
      'Ctrl+Shift+ArrowUp',
      { key: 'ArrowUp', ctrlKey: true, shiftKey: true },
      { type: 'moveTo', target: 'colStart', extend: true },
    ],
    ['PageDown', { key: 'PageDown' }, { type: 'page', direction: 1, extend: false }],
    ['Shift+PageUp', { key: 'PageUp', shiftKey: true }, { type: 'page', direction: -1, extend: true }],
    ['Enter', { key: 'Enter' }, { type: 'edit' }],
    ['F2', { key: 'F2' }, { type: 'edit' }],
    ['a letter', { key: 'x' }, { type: 'type', text: 'x' }],
    ['a digit', { key: '7' }, { type: 'type', text: '7' }],
    ['Shift+letter', { key: 'X', shiftKey: true }, { type: 'type', text: 'X' }],
    ['Space', { key: ' ' }, { type: 'type', text: ' ' }],
    ['Delete', { key: 'Delete' }, { type: 'clear' }],
    ['Backspace', { key: 'Backspace' }, { type: 'clear' }],
    ['Ctrl+D', { key: 'd', ctrlKey: true }, { type: 'fillDown' }],
    ['Cmd+D', { key: 'd', metaKey: true }, { type: 'fillDown' }],
    ['Ctrl+Z', { key: 'z', ctrlKey: true }, { type: 'undo' }],
    ['Cmd+Z', { key: 'z', metaKey: true }, { type: 'undo' }],
    ['Ctrl+Shift+Z', { key: 'Z', ctrlKey: true, shiftKey: true }, { type: 'redo' }],
    ['Cmd+Shift+Z', { key: 'z', metaKey: true, shiftKey: true }, { type: 'redo' }],
    ['Ctrl+Y', { key: 'y', ctrlKey: true }, { type: 'redo' }],
    ['Ctrl+C', { key: 'c', ctrlKey: true }, { type: 'copy' }],
    ['Ctrl+A', { key: 'a', ctrlKey: true }, { type: 'selectAll' }],
    ['Ctrl+Delete', { key: 'Delete', ctrlKey: true }, { type: 'deleteRows' }],
    ['Cmd+Backspace', { key: 'Backspace', metaKey: true }, { type: 'deleteRows' }],
    ['Alt+ArrowDown', { key: 'ArrowDown', altKey: true }, { type: 'openMenu' }],
    ['Shift+F10', { key: 'F10', shiftKey: true }, { type: 'openMenu' }],
    ['ContextMenu', { key: 'ContextMenu' }, { type: 'openMenu' }],
    ['Alt+ArrowRight', { key: 'ArrowRight', altKey: true }, { type: 'resize', delta: RESIZE_STEP_PX }],
    ['Alt+ArrowLeft', { key: 'ArrowLeft', altKey: true }, { type: 'resize', delta: -RESIZE_STEP_PX }],
    ['Escape', { key: 'Escape' }, { type: 'escape' }],
  ])('commandForKey(%s)', (_name, input, expected) => {
    expect(commandForKey(input)).toEqual(expected);
  });

  it.each<[string, KeyInput]>([
    ['Ctrl+V (left to the paste event)', { key: 'v', ctrlKey: true }],
    ['Shift alone', { key: 'Shift', shiftKey: true }],
    ['F5', { key: 'F5' }],
    ['Alt+letter', { key: 'x', altKey: true }],
    ['a key during input-method composition', { key: 'a', isComposing: true }],
  ])('commandForKey(%s) returns null', (_name, input) => {
    expect(commandForKey(input)).toBeNull();
  });
});

describe('editorCommandForKey', () => {
  it.each<[string, KeyInput, unknown]>([
    ['Enter commits and moves down', { key: 'Enter' }, { type: 'commit', rows: 1, cols: 0 }],
    ['Shift+Enter commits and moves up', { key: 'Enter', shiftKey: true }, { type: 'commit', rows: -1, cols: 0 }],
    ['Tab commits and moves right', { key: 'Tab' }, { type: 'commit', rows: 0, cols: 1 }],
    ['Shift+Tab commits and moves left', { key: 'Tab', shiftKey: true }, { type: 'commit', rows: 0, cols: -1 }],
    ['Escape cancels', { key: 'Escape' }, { type: 'cancel' }],
    ['ArrowLeft stays in the text box', { key: 'ArrowLeft' }, null],
    ['Ctrl+Z stays in the text box', { key: 'z', ctrlKey: true }, null],
  ])('editorCommandForKey: %s', (_name, input, expected) => {
    expect(editorCommandForKey(input)).toEqual(expected);
  });
});
