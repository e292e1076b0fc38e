import { ContactOperator, type ContactOperatorKind, LatchMark, LINKAGE_DASH } from './ContactOperator';
import { contactGeometry } from './geometry';
import { round } from './shapes';
import { SymbolBody } from './SymbolBody';
import type { SymbolProps } from './symbol-props';

export interface ContactSymbolProps extends SymbolProps {
  /** Terminal above, terminal below (13/14 normally open, 11/12 or 21/22 normally closed). */
  terminals: readonly [string, string];
  normallyClosed: boolean;
  /** Drawn closed or open; the contact's normal state when left out. */
  closed?: boolean;
  /** What works the contact; a relay contact has none (its coil's tag names it). */
  operator?: ContactOperatorKind;
  /** The operator stays put once worked (selector switch, emergency stop). */
  latching?: boolean;
}

const FIXED = { x: 40, y: 20 };
const PIVOT = { x: 40, y: 40 };
const OPERATOR_X = 16;
const LINK_Y = 30;

/** Where the moving blade ends: on the fixed contact, on the break contact's hook, or swung away. */
function bladeTip(normallyClosed: boolean, closed: boolean) {
  if (!closed) return { x: 30, y: 22 };
  return normallyClosed ? { x: 48, y: 18 } : FIXED;
}

/** A contact in a vertical current path (IEC 60617): a blade hinged on the lower terminal. */
export function ContactSymbol({ terminals, normallyClosed, closed = normallyClosed, operator, latching = false, tag, showPortNumbers }: ContactSymbolProps) {
  const geometry = contactGeometry(terminals[0], terminals[1]);
  const tip = bladeTip(normallyClosed, closed);
  const linkX = round(PIVOT.x + ((tip.x - PIVOT.x) * (PIVOT.y - LINK_Y)) / (PIVOT.y - tip.y));
  return (
    <SymbolBody anchors={geometry.ports} tag={tag} showPortNumbers={showPortNumbers}>
      <path d={`M${FIXED.x} 0 V${FIXED.y}${normallyClosed ? ' H47' : ''} M${PIVOT.x} 60 V${PIVOT.y}`} />
      <path data-part="blade" data-closed={closed} d={`M${PIVOT.x} ${PIVOT.y} L${tip.x} ${tip.y}`} />
      {operator ? (
        <>
          <ContactOperator kind={operator} x={OPERATOR_X} y={LINK_Y} />
          <path d={`M${OPERATOR_X} ${LINK_Y} H${linkX}`} strokeDasharray={LINKAGE_DASH} />
          {latching ? <LatchMark x={OPERATOR_X + 4} y={LINK_Y} /> : null}
        </>
      ) : null}
    </SymbolBody>
  );
}
