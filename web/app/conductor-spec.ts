// Finding a library conductor by the id a section's conductor record keeps.
import { CONDUCTOR_LIBRARY, type Conductor } from '../../core/conductors';

export function findLibraryConductor(id: string | undefined): Conductor | undefined {
  return CONDUCTOR_LIBRARY.find((conductor) => conductor.id === id);
}
