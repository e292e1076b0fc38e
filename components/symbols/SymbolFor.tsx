import { componentTypeById } from '@/engine/components/registry';
import { parameterDefaults, type ParameterValues } from '@/engine/components/types';
import { FallbackSymbol } from './FallbackSymbol';
import { symbolGeometry } from './geometry';
import { DRAWINGS } from './symbol-drawings';
import type { ShownState } from './symbol-props';

export interface SymbolForProps extends ShownState {
  typeId: string;
  /** The placed component's parameters; the type's defaults fill the rest. */
  parameters?: ParameterValues;
  className?: string;
}

/**
 * The symbol of any component type as an `<svg>` the size of its box. Never throws: an
 * unknown type, or one its drawing cannot serve, gets a marked stand-in. Drawing overflows
 * the box only where a switched valve's body has moved sideways.
 */
export function SymbolFor({ typeId, parameters = {}, className, ...shown }: SymbolForProps) {
  const type = componentTypeById(typeId);
  const geometry = symbolGeometry(typeId);
  const draw = type && Object.hasOwn(DRAWINGS, typeId) ? DRAWINGS[typeId] : undefined;
  const drawing = type && draw ? draw({ type, parameters: { ...parameterDefaults(type), ...parameters }, ...shown }) : null;
  return (
    <svg
      xmlns="http://www.w3.org/2000/svg"
      width={geometry.width}
      height={geometry.height}
      viewBox={`0 0 ${geometry.width} ${geometry.height}`}
      overflow="visible"
      role="img"
      aria-label={[type?.label ?? typeId, shown.tag].filter(Boolean).join(' ')}
      data-symbol={typeId}
      data-fallback={drawing ? undefined : true}
      className={className}
    >
      {drawing ?? <FallbackSymbol typeId={typeId} geometry={geometry} tag={shown.tag} showPortNumbers={shown.showPortNumbers} />}
    </svg>
  );
}
