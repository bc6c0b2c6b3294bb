/**
 * GeoJSON (RFC 7946) of a line for GIS: structures as Points, spans as LineStrings between their structures.
 *
 * - Positions are [longitude, latitude] (RFC 7946 section 3.1.1), WGS 84 degrees, rounded to
 *   {@link GEOJSON_COORDINATE_DECIMALS} decimals (about 1 cm; section 11.2 advises against false precision).
 * - No third coordinate: RFC 7946 altitude is height above the WGS 84 ellipsoid, while our elevations share a
 *   site datum of the crew's choosing, so they travel as properties instead.
 * - A span whose two structures are not both positioned is left out; deleted records (tombstones) are left out.
 * - A span crossing the antimeridian is cut in two and written as a MultiLineString (section 3.1.9).
 * - Property names are snake_case with the SI unit as suffix (`span_length_m`, `horizontal_tension_n`), so a GIS
 *   table says its units without a legend.
 */
import type { SpanRecord } from '../records/span';
import type { StructureRecord } from '../records/structure';

/** Decimals kept on longitude and latitude: 1e-7 degree is about 1.1 cm on the equator. */
export const GEOJSON_COORDINATE_DECIMALS = 7;

/** Figures shown for a span (SI); every field optional because a span may have no reading yet. */
export interface SpanGeoFigures {
  /** Worst verdict over the span's wires, e.g. 'within', 'too-slack', 'too-tight', 'recheck'. */
  verdict?: string;
  /** Why, in words. */
  verdictReason?: string;
  /** Solved horizontal tension of the governing wire, N. */
  horizontalTension?: number;
  /** Measured (solved) midspan sag, m. */
  sag?: number;
  /** Design midspan sag at the reading's conductor temperature, m. */
  designSag?: number;
  /** Measured minus design sag, m (positive = slacker than design). */
  sagDeviation?: number;
}

export interface GeoJsonExportInput {
  structures: readonly StructureRecord[];
  spans: readonly SpanRecord[];
  /** Figures per span, from the assessment; absent or undefined leaves the properties null. */
  figuresForSpan?: (span: SpanRecord) => SpanGeoFigures | undefined;
}

export type GeoJsonPosition = [longitude: number, latitude: number];

export type GeoJsonGeometry =
  | { type: 'Point'; coordinates: GeoJsonPosition }
  | { type: 'LineString'; coordinates: GeoJsonPosition[] }
  | { type: 'MultiLineString'; coordinates: GeoJsonPosition[][] };

export type GeoJsonProperties = Record<string, string | number | null>;

export interface GeoJsonFeature {
  type: 'Feature';
  id: string;
  geometry: GeoJsonGeometry;
  properties: GeoJsonProperties;
}

export interface GeoJsonFeatureCollection {
  type: 'FeatureCollection';
  features: GeoJsonFeature[];
}

function roundDegrees(value: number): number {
  const factor = 10 ** GEOJSON_COORDINATE_DECIMALS;
  return Math.round(value * factor) / factor;
}

function positionOf(structure: StructureRecord | undefined): GeoJsonPosition | undefined {
  const position = structure?.position;
  if (!position) return undefined;
  return [roundDegrees(position.longitude), roundDegrees(position.latitude)];
}

function numberOrNull(value: number | undefined): number | null {
  return value !== undefined && Number.isFinite(value) ? value : null;
}

/**
 * The geometry of a segment between two positions: a LineString, or a MultiLineString cut at ±180° when the
 * short way between the ends crosses the antimeridian (RFC 7946 section 3.1.9). Latitude at the cut is
 * interpolated linearly in degrees, which is exact enough over a span's few hundred metres.
 */
export function geoJsonSegment(near: GeoJsonPosition, far: GeoJsonPosition): GeoJsonGeometry {
  const [nearLon, nearLat] = near;
  const [farLon, farLat] = far;
  if (Math.abs(farLon - nearLon) <= 180) return { type: 'LineString', coordinates: [near, far] };
  // Going east across 180° when near is positive, west across −180° otherwise.
  const edge = nearLon > 0 ? 180 : -180;
  const farUnwrapped = farLon + (nearLon > 0 ? 360 : -360);
  const fraction = (edge - nearLon) / (farUnwrapped - nearLon);
  const cutLat = roundDegrees(nearLat + fraction * (farLat - nearLat));
  return {
    type: 'MultiLineString',
    coordinates: [
      [near, [edge, cutLat]],
      [[-edge, cutLat], far],
    ],
  };
}

/** The FeatureCollection: live structures with a position, then live spans whose two structures have one. */
export function buildGeoJson(input: GeoJsonExportInput): GeoJsonFeatureCollection {
  const features: GeoJsonFeature[] = [];
  const liveStructures = input.structures.filter((structure) => !structure.deleted);
  const structuresById = new Map(liveStructures.map((structure) => [structure.id, structure]));

  for (const structure of [...liveStructures].sort((a, b) => a.order - b.order)) {
    const coordinates = positionOf(structure);
    if (!coordinates) continue;
    features.push({
      type: 'Feature',
      id: structure.id,
      geometry: { type: 'Point', coordinates },
      properties: {
        kind: 'structure',
        id: structure.id,
        line_id: structure.lineId,
        label: structure.label,
        order: structure.order,
        ground_elevation_m: numberOrNull(structure.groundElevation),
        attachment_height_m: numberOrNull(structure.attachmentHeight),
        position_accuracy_m: numberOrNull(structure.position?.accuracy),
      },
    });
  }

  for (const span of input.spans) {
    if (span.deleted) continue;
    const near = structuresById.get(span.nearStructureId);
    const far = structuresById.get(span.farStructureId);
    const nearPosition = positionOf(near);
    const farPosition = positionOf(far);
    if (!near || !far || !nearPosition || !farPosition) continue;
    const figures = input.figuresForSpan?.(span) ?? {};
    features.push({
      type: 'Feature',
      id: span.id,
      geometry: geoJsonSegment(nearPosition, farPosition),
      properties: {
        kind: 'span',
        id: span.id,
        line_id: span.lineId,
        section_id: span.sectionId,
        near_structure_id: near.id,
        far_structure_id: far.id,
        label: `${near.label}–${far.label}`,
        verdict: figures.verdict ?? null,
        verdict_reason: figures.verdictReason ?? null,
        span_length_m: span.length,
        horizontal_tension_n: numberOrNull(figures.horizontalTension),
        sag_m: numberOrNull(figures.sag),
        design_sag_m: numberOrNull(figures.designSag),
        sag_deviation_m: numberOrNull(figures.sagDeviation),
      },
    });
  }

  return { type: 'FeatureCollection', features };
}

/** The collection as text, media type application/geo+json (RFC 7946 section 12). */
export function writeGeoJson(input: GeoJsonExportInput): string {
  return JSON.stringify(buildGeoJson(input), null, 1);
}

export const GEOJSON_MEDIA_TYPE = 'application/geo+json';
