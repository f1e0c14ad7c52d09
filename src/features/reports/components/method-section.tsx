import type { ReactNode } from 'react';
import type { ReportRun } from '../../../../shared/report/report-data';
import { SubHeading } from './report-layout';

function Equation({ children }: { children: ReactNode }) {
  return <p className="num keep-together my-1 rounded bg-mist/60 px-3 py-1 text-xs print:bg-transparent print:px-0">{children}</p>;
}

const classification: Record<ReportRun['scenario']['system']['kind'], ReactNode> = {
  'direct-air': (
    <>
      <p>
        <strong>Direct outdoor air</strong> (the hall's moisture equals the supply's): an hour is mechanical when W &gt; W_hi (dehumidify); free
        cooling when T + f ≤ T_s and W ≥ W_lo (below W_lo, adiabatic assist when there is an evaporative stage, which humidifies; otherwise free
        cooling flagged as a low-humidity excursion); when T + f &gt; T_s, adiabatic assist if the evaporative stage brings the air to T_s − f
        with W on the wet-bulb line ≤ W_hi, otherwise mechanical.
      </p>
      <Equation>T_out = T − ε·(T − T_wb) ≤ T_s − f</Equation>
    </>
  ),
  'indirect-air': (
    <>
      <p>
        <strong>Indirect air-to-air exchanger</strong> (hall moisture unaffected): free when the dry supply temperature reaches the setpoint,
        adiabatic assist when the wetted scavenger air does, otherwise mechanical.
      </p>
      <Equation>T_sup = T_r − ε_hx·(T_r − T_sc) + f,  T_sc = T (dry) or T − ε·(T − T_wb) (wetted)</Equation>
    </>
  ),
  'water-side': (
    <>
      <p>
        <strong>Water-side economiser</strong>: with a cooling tower, free when T_wb + approach ≤ T_chws, else mechanical; with a dry cooler, free
        when T + approach ≤ T_chws, adiabatic assist when the wetted cooler reaches it, else mechanical.
      </p>
      <Equation>T_water = T_wb + approach (tower) · T + approach (dry) · T − ε·(T − T_wb) + approach (wetted)</Equation>
    </>
  ),
};

/** How the figures were computed, with the equations and their sources (README "How it works"). */
export function MethodSection({ runs }: { runs: ReportRun[] }) {
  const kinds = [...new Set(runs.map((r) => r.scenario.system.kind))];
  const engines = [...new Set(runs.map((r) => r.engineVersion))];
  return (
    <div className="space-y-3 text-sm leading-relaxed" data-testid="report-method">
      <p>
        Every hour of the climate file is classified on its own, then the hours are summed. Hours without usable data are counted as no data,
        never guessed. Engine version {engines.join(', ')}.
      </p>
      <SubHeading>Moist air at the site's pressure</SubHeading>
      <p>
        ASHRAE Handbook—Fundamentals (2017), chapter 1: saturation pressure by Hyland–Wexler (eq. 5 over ice, eq. 6 over water); station pressure
        from the file, or the standard atmosphere at the site elevation (eq. 3); humidity ratio, relative humidity and dew point (eq. 20, 22, 36);
        enthalpy (eq. 32); thermodynamic wet-bulb solved from the psychrometric equation (eq. 33 over water, eq. 35 over ice).
      </p>
      <Equation>p = 101.325 kPa · (1 − 2.25577·10⁻⁵·Z)^5.2559</Equation>
      <Equation>W = 0.621945 · p_w / (p − p_w)      h = 1.006·t + W·(2501 + 1.86·t)  kJ/kg dry air</Equation>
      <Equation>W = ((2501 − 2.326·t*)·W_s* − 1.006·(t − t*)) / (2501 + 1.86·t − 4.186·t*)</Equation>
      <SubHeading>Inlet envelope</SubHeading>
      <p>
        Limits from ASHRAE TC 9.9, Thermal Guidelines for Data Processing Environments (edition named with the envelope). The highest dry-bulb is
        derated with altitude: T_max,site = T_max − max(0, Z − Z₀)/m. Supply moisture limits at the hour's pressure: W_hi = min(W(dew point max),
        W(T_s, RH max)); W_lo = max(W(dew point min), W(T_s, RH min)).
      </p>
      <SubHeading>Classifying each hour</SubHeading>
      <p className="text-ink-soft">
        T outdoor dry-bulb, W humidity ratio, T_wb wet-bulb, T_s supply setpoint, f fan heat, ΔT rise across the IT, T_r = T_s + ΔT return, ε
        evaporative effectiveness.
      </p>
      {kinds.map((kind) => (
        <div key={kind}>{classification[kind]}</div>
      ))}
      <SubHeading>Energy and water per hour</SubHeading>
      <p>
        Cooling load Q = P_IT + P_fan. Hall air flow ṁ = P_IT / (c_p·ΔT) with c_p = 1.006 kJ/(kg·K) (eq. 32, dry air). Compressors carry the
        mechanical fraction of the load at a COP that varies linearly with outdoor dry-bulb (common practice for screening, not a chiller curve).
        Fans every hour with data; pumps as the system needs them. Water is what the evaporative stage or the tower evaporates (tower: a share of
        the rejected heat over h_fg ≈ 2430 kJ/kg, common practice, recalled from memory), plus blowdown.
      </p>
      <Equation>P_comp = f_mech·Q / COP(T),  COP(T) = max(COP_min, COP_ref + slope·(T − T_ref))</Equation>
      <Equation>pPUE = (E_IT + E_fans + E_compressors + E_pumps) / E_IT        (partial PUE of the cooling subsystem, ISO/IEC 30134-2)</Equation>
      <Equation>WUE = site water use (L) / IT energy (kWh)        (ISO/IEC 30134-9)</Equation>
      <p className="text-ink-soft">
        Energy and water are summed over the hours with data; "per 8,760 h" scales those sums to a year of hours with data so files of different
        lengths compare.
      </p>
      <div className="keep-together">
        <SubHeading>Sources</SubHeading>
        <ul className="list-disc space-y-0.5 pl-5">
          <li>ASHRAE Handbook—Fundamentals (2017), chapter 1, Psychrometrics.</li>
          <li>ASHRAE TC 9.9, Thermal Guidelines for Data Processing Environments, 5th edition (2021) and 4th edition (2015).</li>
          <li>ISO/IEC 30134-2 (power usage effectiveness) and ISO/IEC 30134-9 (water usage effectiveness).</li>
        </ul>
      </div>
    </div>
  );
}

/** What the model leaves out, beside the product's cautions. */
export function ModelLimits() {
  return (
    <p className="text-sm text-ink-soft">
      Not modelled: latent loads inside the hall, minimum outdoor air, coil condensation at the supply temperature and part-load fan laws.
    </p>
  );
}
