// Library conductor → the conductor record a section stores (a copy, with its source and library id).
import { CONDUCTOR_LIBRARY, type Conductor } from '../../core/conductors';
import type { ConductorSpec } from '../../core/records/conductor';

export function libraryLabel(conductor: Conductor): string {
  return `${conductor.name} ${conductor.sizeLabel}`;
}

export function specFromLibrary(conductor: Conductor): ConductorSpec {
  return {
    name: libraryLabel(conductor),
    diameter: conductor.diameter,
    area: conductor.area,
    weight: conductor.weight,
    ratedStrength: conductor.ratedStrength,
    modulus: conductor.modulus,
    expansion: conductor.expansion,
    ...(conductor.composite ? { composite: { ...conductor.composite } } : {}),
    source: conductor.source,
    libraryId: conductor.id,
  };
}

export function findLibraryConductor(id: string | undefined): Conductor | undefined {
  return CONDUCTOR_LIBRARY.find((conductor) => conductor.id === id);
}
