import { customType } from 'drizzle-orm/pg-core';

/**
 * PostGIS geometry with its SRID in the column type (drizzle's built-in geometry() drops the SRID).
 * Written as EWKT, read back as EWKB hex; spatial reads go through ST_AsGeoJSON / ST_X / ST_Y in SQL.
 */
export const pointGeometry = customType<{ data: string; driverData: string }>({
  dataType: () => 'geometry(Point,4326)',
});

export const polygonGeometry = customType<{ data: string; driverData: string }>({
  dataType: () => 'geometry(Polygon,4326)',
});

export const multiPolygonGeometry = customType<{ data: string; driverData: string }>({
  dataType: () => 'geometry(MultiPolygon,4326)',
});

export const lineGeometry = customType<{ data: string; driverData: string }>({
  dataType: () => 'geometry(LineString,4326)',
});

/** EWKT for a WGS 84 point. */
export const ewktPoint = (lon: number, lat: number) => `SRID=4326;POINT(${lon} ${lat})`;
