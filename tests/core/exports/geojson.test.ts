// GeoJSON of a line, checked with @placemarkio/check-geojson (a general-purpose GeoJSON validator from the npm
// registry) and with explicit RFC 7946 rules: section 3.1.1 (position = [longitude, latitude], degrees),
// 3.1.2 Point, 3.1.4 LineString (two or more positions), 3.1.9 antimeridian cutting, 3.2 Feature, 3.3
// FeatureCollection.
import { check, getIssues } from '@placemarkio/check-geojson';
import { describe, expect, it } from 'vitest';
import {
  GEOJSON_COORDINATE_DECIMALS,
  buildGeoJson,
  geoJsonSegment,
  lineGeoJson,
  writeGeoJson,
  type GeoJsonFeature,
  type GeoJsonPosition,
} from '../../../core';
import { expectClose } from '../../helpers/expect-close';
import { fixtureLine, fixtureLogInput, fixtureResult } from './line-fixture';

function positionsOf(feature: GeoJsonFeature): GeoJsonPosition[] {
  const geometry = feature.geometry;
  if (geometry.type === 'Point') return [geometry.coordinates];
  if (geometry.type === 'LineString') return geometry.coordinates;
  return geometry.coordinates.flat();
}

describe('GeoJSON export (RFC 7946)', () => {
  const records = fixtureLine({ spans: 5 });
  // Take the position off one structure: its two spans must be left out.
  const unplaced = records.structure[3];
  if (unplaced) delete unplaced.position;
  const collection = lineGeoJson(fixtureLogInput(records));
  const text = JSON.stringify(collection);

  it('passes the general-purpose validator', () => {
    expect(getIssues(text)).toStrictEqual([]);
    expect(() => {
      check(text);
    }).not.toThrow();
  });

  it('the validator is not a rubber stamp: it rejects a LineString with one position', () => {
    const broken = {
      type: 'FeatureCollection',
      features: [
        { type: 'Feature', properties: {}, geometry: { type: 'LineString', coordinates: [[19.4, 51.7]] } },
      ],
    };
    expect(getIssues(JSON.stringify(broken)).length).toBeGreaterThan(0);
  });

  it('writes structures as Points and spans as LineStrings, only spans with both ends positioned', () => {
    expect(collection.type).toBe('FeatureCollection');
    const points = collection.features.filter((feature) => feature.geometry.type === 'Point');
    const lines = collection.features.filter((feature) => feature.geometry.type === 'LineString');
    expect(points).toHaveLength(records.structure.length - 1);
    expect(lines).toHaveLength(records.span.length - 2);
    for (const line of lines) {
      expect(line.geometry.type === 'LineString' && line.geometry.coordinates).toHaveLength(2);
      expect(line.properties.near_structure_id).not.toBe(unplaced?.id);
      expect(line.properties.far_structure_id).not.toBe(unplaced?.id);
    }
    for (const feature of collection.features) {
      expect(feature.type).toBe('Feature');
      expect(typeof feature.id).toBe('string');
    }
  });

  it('puts longitude first and latitude second, within range (section 3.1.1)', () => {
    // The fixture line lies near 51.76° N, 19.46° E: latitude and longitude differ enough that a swap shows.
    for (const feature of collection.features) {
      for (const [longitude, latitude] of positionsOf(feature)) {
        expect(longitude).toBeGreaterThanOrEqual(-180);
        expect(longitude).toBeLessThanOrEqual(180);
        expect(latitude).toBeGreaterThanOrEqual(-90);
        expect(latitude).toBeLessThanOrEqual(90);
      }
    }
    const first = records.structure[0];
    const point = collection.features.find((feature) => feature.id === first?.id);
    expect(point?.geometry).toStrictEqual({
      type: 'Point',
      coordinates: [first?.position?.longitude, first?.position?.latitude],
    });
    expect(positionsOf(point ?? collection.features[0]!)[0]?.length).toBe(2);
  });

  it('carries ids, labels, verdict and SI figures with unit-suffixed names', () => {
    const span = records.span[0];
    const feature = collection.features.find((item) => item.id === span?.id);
    expect(feature?.properties).toMatchObject({
      kind: 'span',
      id: span?.id,
      section_id: span?.sectionId,
      label: 'S-1–S-2',
      span_length_m: span?.length,
    });
    // The span's figures come from its worst wire (latest readings): one of the three fixture results.
    const candidates = records.reading
      .filter((reading) => reading.spanId === span?.id)
      .map((reading) => fixtureResult(reading));
    const tension = feature?.properties.horizontal_tension_n;
    expect(candidates.map((result) => result.horizontalTension)).toContain(tension);
    const chosen = candidates.find((result) => result.horizontalTension === tension);
    expect(feature?.properties.verdict).toBe(chosen?.verdict);
    expect(feature?.properties.sag_m).toBe(chosen?.sag);
    expect(feature?.properties.design_sag_m).toBe(chosen?.designSag);
    expect(feature?.properties.sag_deviation_m).toBe(chosen?.sagDeviation);
  });

  it('rounds coordinates to 7 decimals (about 1 cm) and writes no altitude', () => {
    const structure = {
      ...records.structure[0]!,
      position: { latitude: 51.123456789, longitude: -0.987654321 },
    };
    const single = buildGeoJson({ structures: [structure], spans: [] });
    const coordinates = single.features[0]?.geometry.coordinates as GeoJsonPosition;
    expect(GEOJSON_COORDINATE_DECIMALS).toBe(7);
    expect(coordinates).toStrictEqual([-0.9876543, 51.1234568]);
  });

  it('leaves deleted structures and spans out', () => {
    const copy = fixtureLine({ spans: 2 });
    const span = copy.span[0];
    if (span) span.deleted = true;
    const result = buildGeoJson({ structures: copy.structure, spans: copy.span });
    expect(result.features.filter((feature) => feature.properties.kind === 'span')).toHaveLength(1);
  });

  it('cuts a span across the antimeridian into a MultiLineString (section 3.1.9)', () => {
    const geometry = geoJsonSegment([179.9995, -16.8], [-179.9995, -16.801]);
    expect(geometry.type).toBe('MultiLineString');
    if (geometry.type !== 'MultiLineString') return;
    const [west, east] = geometry.coordinates;
    expect(west?.[1]?.[0]).toBe(180);
    expect(east?.[0]?.[0]).toBe(-180);
    // Halfway in longitude, so the cut latitude is halfway too (linear interpolation).
    expectClose(west?.[1]?.[1] ?? 0, -16.8005, 1e-9, 'latitude at the cut');
    const doc = JSON.stringify({
      type: 'FeatureCollection',
      features: [{ type: 'Feature', properties: {}, geometry }],
    });
    expect(getIssues(doc)).toStrictEqual([]);
  });

  it('writeGeoJson gives parseable text equal to the collection', () => {
    const input = { structures: records.structure, spans: records.span };
    expect(JSON.parse(writeGeoJson(input))).toStrictEqual(buildGeoJson(input));
  });
});
