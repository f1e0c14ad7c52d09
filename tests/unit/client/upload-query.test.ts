import { describe, expect, it } from 'vitest';
import { uploadQuery } from '@/features/climate-files/api/send-file';
import { climateUploadQuerySchema } from '../../../shared/schemas/climate-file';

describe('the upload query the wizard sends', () => {
  it('carries the file name, gap length, time basis, mapping and humidity option, and passes the server schema', () => {
    const query = uploadQuery({
      fileName: 'mesa-alta-ridge.csv',
      name: 'Mesa Alta 2021–2023',
      maxGapHours: 4,
      timeBasis: 'site-standard',
      mapping: { dryBulb: { column: 'Temp (F)', unit: 'F' } },
      humidityOverIce: true,
    });
    const parsed = climateUploadQuerySchema.parse(Object.fromEntries(new URLSearchParams(query)));
    expect(parsed).toEqual({
      fileName: 'mesa-alta-ridge.csv',
      name: 'Mesa Alta 2021–2023',
      maxGapHours: 4,
      timeBasis: 'site-standard',
      mapping: { dryBulb: { column: 'Temp (F)', unit: 'F' } },
      humidityOverIce: true,
    });
    // Left out, the option is false: humidity over liquid water (WMO-No. 8).
    expect(
      climateUploadQuerySchema.parse(Object.fromEntries(new URLSearchParams(uploadQuery({ fileName: 'a.csv', maxGapHours: 6, timeBasis: 'utc' })))),
    ).toMatchObject({
      humidityOverIce: false,
    });
  });
});
