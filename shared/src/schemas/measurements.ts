import { z } from 'zod';
import { idSchema, timestampSchema } from './common';

/** A measured moment of inertia of a prototype (pendulum rig), stored in kg·m². */
export const measurementSchema = z.object({
  id: idSchema,
  axis: z.string().describe('which axis, in words or as a principal role'),
  value: z.number().describe('kg·m²'),
  enteredValue: z.number(),
  enteredUnit: z.string(),
  method: z.string(),
  predicted: z.number().nullable().describe('the variant’s predicted moment about that axis (kg·m²), when the axis is recognised'),
  differencePercent: z.number().nullable(),
  importId: idSchema
    .nullable()
    .describe('the CSV import the row came in with (rows of one file share it); null for rows recorded before imports were tracked'),
  createdAt: timestampSchema,
});
export type Measurement = z.infer<typeof measurementSchema>;

/** What a removal of measured rows answers: how many rows went. */
export const measurementsRemovedSchema = z.object({ removed: z.number().int().describe('rows removed') });
export type MeasurementsRemoved = z.infer<typeof measurementsRemovedSchema>;

/** CSV columns of a measured-data upload, in this order (header row required). */
export const MEASUREMENT_CSV_COLUMNS = ['axis', 'value', 'unit', 'method'] as const;
/** Units accepted in the `unit` column: the display labels and their plain-ASCII spellings. */
export const MEASUREMENT_UNITS: Record<string, 'kg·m²' | 'kg·cm²' | 'g·cm²' | 'oz·in²'> = {
  'kg·m²': 'kg·m²',
  'kg*m^2': 'kg·m²',
  'kg m^2': 'kg·m²',
  kgm2: 'kg·m²',
  'kg·cm²': 'kg·cm²',
  'kg*cm^2': 'kg·cm²',
  'kg cm^2': 'kg·cm²',
  kgcm2: 'kg·cm²',
  'g·cm²': 'g·cm²',
  'g*cm^2': 'g·cm²',
  'g cm^2': 'g·cm²',
  gcm2: 'g·cm²',
  'oz·in²': 'oz·in²',
  'oz*in^2': 'oz·in²',
  'oz in^2': 'oz·in²',
  ozin2: 'oz·in²',
};

/** Axis words recognised for the predicted value; anything else is stored with no prediction. */
export const MEASUREMENT_AXES = ['major', 'intermediate', 'minor', 'swing', 'twist', 'pivot'] as const;
