/**
 * Synthetic texts in the published formats for the climate-import suite: a typical-year EPW
 * (8760 records of 35 fields, months from different years) and fixed-width station records.
 */
// @ts-nocheck


/** A typical-year EPW text: the eight header records, then 8760 hourly records, each month from another source year. */
export function typicalYearEpwText(): string {
  const lines = [
    'LOCATION,Bench Synthetic Station,Nowhere,Invented Land,SYNTHETIC,999003,48.5,11.25,1.0,480.0',
    'DESIGN CONDITIONS,0',
    'TYPICAL/EXTREME PERIODS,0',
    'GROUND TEMPERATURES,0',
    'HOLIDAYS/DAYLIGHT SAVINGS,No,0,0,0',
    'COMMENTS 1,Synthetic benchmark data: invented values.',
    'COMMENTS 2,',
    'DATA PERIODS,1,1,Data,Sunday, 1/ 1,12/31',
  ];
  let k = 0;
  for (let month = 1; month <= 12; month++) {
    const year = 1995 + ((month * 7) % 13);
    const days = new Date(Date.UTC(2001, month, 0)).getUTCDate();
    for (let day = 1; day <= days; day++) {
      for (let hour = 1; hour <= 24; hour++, k++) {
        const db = 9 + 10 * Math.sin((2 * Math.PI * (k - 2500)) / 8760) + 4 * Math.sin((2 * Math.PI * (hour - 9)) / 24);
        const dp = db - 4 - 2 * Math.sin((2 * Math.PI * (hour - 9)) / 24);
        const rh = Math.round(100 * Math.exp((17.62 * dp) / (243.12 + dp) - (17.62 * db) / (243.12 + db)));
        lines.push(
          `${year},${month},${day},${hour},60,?9?9?9?9E0?9?9?9?9?9?9?9?9?9?9?9?9?9?9?9*9*9?9?9?9,${db.toFixed(1)},${dp.toFixed(1)},${rh},${95500 + (k % 300)},0,0,280,0,0,0,0,0,0,0,0,0,200,3.1,8,8,20.0,1000,9,999999999,0,0.0,0,88,0.0`,
        );
      }
    }
  }
  return `${lines.join('\r\n')}\r\n`;
}

/** Fixed-width station records for the whole years from..to (UTC hours), one text. */
export function stationRecordsText(fromYear: number, toYear: number): string {
  const out: string[] = [];
  const pad = (n: number, width: number) => String(n).padStart(width, ' ');
  const two = (n: number) => String(n).padStart(2, '0');
  for (let t = Date.UTC(fromYear, 0, 1), k = 0; t < Date.UTC(toYear + 1, 0, 1); t += 3_600_000, k++) {
    const d = new Date(t);
    const temp = Math.round(10 * (10 + 9 * Math.sin((2 * Math.PI * k) / 8766) + 4 * Math.sin((2 * Math.PI * k) / 24)));
    const dew = temp - 40 - (k % 30);
    out.push(
      `${d.getUTCFullYear()} ${two(d.getUTCMonth() + 1)} ${two(d.getUTCDate())} ${two(d.getUTCHours())}${pad(temp, 6)}${pad(dew, 6)}${pad(10150 + (k % 80), 6)}${pad(200, 6)}${pad(31, 6)}${pad(4, 6)}${pad(0, 6)}${pad(-9999, 6)}`,
    );
  }
  return `${out.join('\n')}\n`;
}
