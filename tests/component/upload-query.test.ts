import { describe, expect, it } from 'vitest';
import { uploadQuery } from '@/features/climate-files/api/send-file';
import { climateUploadQuerySchema } from '../../shared/schemas/climate-file';

describe('the upload query the wizard sends', () => {
  it('carries the file name, gap length, time basis and mapping, and passes the server schema', () => {
    const query = uploadQuery({
      fileName: 'mesa-alta-ridge.csv',
      name: 'Mesa Alta 2021–2023',
      maxGapHours: 4,
      timeBasis: 'site-standard',
      mapping: { dryBulb: { column: 'Temp (F)', unit: 'F' } },
    });
    const parsed = climateUploadQuerySchema.parse(Object.fromEntries(new URLSearchParams(query)));
    expect(parsed).toEqual({
      fileName: 'mesa-alta-ridge.csv',
      name: 'Mesa Alta 2021–2023',
      maxGapHours: 4,
      timeBasis: 'site-standard',
      mapping: { dryBulb: { column: 'Temp (F)', unit: 'F' } },
    });
  });
});
