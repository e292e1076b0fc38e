import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { EditorToolbar } from '@/components/editor/EditorToolbar';

// Rendered to markup without a DOM: this checks which drawing commands are offered for a selection.

const nothing = () => {};

function render(partsSelected: number, canEdit = true) {
  return renderToStaticMarkup(
    <EditorToolbar
      title="Press 2"
      revisionNumber={3}
      unsaved={false}
      canEdit={canEdit}
      canUndo={false}
      canRedo={false}
      hasSelection={partsSelected > 0}
      paletteOpen={false}
      detailsOpen={false}
      onUndo={nothing}
      onRedo={nothing}
      onDelete={nothing}
      onDuplicate={nothing}
      canDuplicate={partsSelected > 0}
      partsSelected={partsSelected}
      onTurn={nothing}
      onFlip={nothing}
      onAlign={nothing}
      onDistribute={nothing}
      onFit={nothing}
      onSave={nothing}
      onTogglePalette={nothing}
      onToggleDetails={nothing}
    />,
  );
}

/** Whether the element with the test id, or the option with the value, is offered (present and not disabled). */
function offered(markup: string, pattern: RegExp): boolean | 'absent' {
  const tag = pattern.exec(markup)?.[0];
  return tag === undefined ? 'absent' : !/ disabled=""/.test(tag);
}

const turn = /<button[^>]*data-testid="turn-selection"[^>]*>/;
const flip = /<button[^>]*data-testid="flip-selection"[^>]*>/;
const align = /<select[^>]*data-testid="align-selection"[^>]*>/;
const lineUp = /<option[^>]*value="align:left"[^>]*>/;
const spread = /<option[^>]*value="spread:horizontal"[^>]*>/;

describe('EditorToolbar', () => {
  it('offers turning and flipping for one part, aligning for two, spacing out for three', () => {
    const offers = (parts: number) => [turn, flip, align, lineUp, spread].map((p) => offered(render(parts), p));
    expect(offers(0)).toEqual([false, false, false, true, false]);
    expect(offers(1)).toEqual([true, true, false, true, false]);
    expect(offers(2)).toEqual([true, true, true, true, false]);
    expect(offers(3)).toEqual([true, true, true, true, true]);
  });

  it('names the align list for assistive technology and lists every alignment', () => {
    const markup = render(2);
    expect(align.exec(markup)?.[0]).toContain('aria-label="Align the selected parts"');
    expect([...markup.matchAll(/value="(align|spread):(\w+)"/g)].map((m) => m[2])).toEqual(['left', 'centre', 'right', 'top', 'middle', 'bottom', 'horizontal', 'vertical']);
  });

  it('leaves the drawing commands out when the drawing cannot be edited', () => {
    expect([turn, flip, align].map((p) => offered(render(3, false), p))).toEqual(['absent', 'absent', 'absent']);
  });

  it('lists the turn and flip keys on the key sheet', () => {
    const markup = render(0);
    expect(markup).toContain('<kbd>R, Shift+R</kbd></dt><dd class="text-ink-soft">Turn the selected parts clockwise, anticlockwise</dd>');
    expect(markup).toContain('<kbd>F</kbd></dt><dd class="text-ink-soft">Flip the selected parts left to right</dd>');
  });
});
