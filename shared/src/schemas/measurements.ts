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
  createdAt: timestampSchema,
});
export type Measurement = z.infer<typeof measurementSchema>;

/** CSV columns of a measured-data upload, in this order (header row required). */
export const MEASUREMENT_CSV_COLUMNS = ['axis', 'value', 'unit', 'method'] as const;
export const MEASUREMENT_UNITS = ['kg*m^2', 'g*cm^2', 'kg*cm^2', 'oz*in^2'] as const;
