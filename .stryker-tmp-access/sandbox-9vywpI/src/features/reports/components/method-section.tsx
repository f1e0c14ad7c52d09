// @ts-nocheck
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
        <strong>Direct outdoor air</strong> (the hall's moisture equals the supply's): an hour is mechanical when W &gt; W_hi (dehumidify); free cooling when T
        + f ≤ T_s — when W &lt; W_lo it is free cooling with humidification if there is an evaporative stage (the stage only adds moisture, mixed with return
        air by enthalpy), otherwise free cooling flagged as a low-humidity excursion; when T + f &gt; T_s, adiabatic assist if the evaporative stage brings the
        air to T_s − f with W on the wet-bulb line ≤ W_hi, otherwise mechanical, with the stage modulated to the moisture limit.
      </p>
      <Equation>T_out = T − ε·(T − T_wb) ≤ T_s − f</Equation>
    </>
  ),
  'indirect-air': (
    <>
      <p>
        <strong>Indirect air-to-air exchanger</strong> (hall moisture unaffected): free when the dry supply temperature reaches the setpoint, adiabatic assist
        when the wetted scavenger air does, otherwise mechanical. The exchanger's effectiveness follows the scavenger-to-hall air ratio r by ε-NTU for
        cross-flow with both streams unmixed (Incropera et al., Fundamentals of Heat and Mass Transfer, Table 11.3, recalled from memory), from the rated
        effectiveness at r = 1 with UA held at its rating.
      </p>
      <Equation>T_sup = T_r − ε_hx·(T_r − T_sc) + f, T_sc = T (dry) or T − ε·(T − T_wb) (wetted)</Equation>
      <Equation>ε = 1 − exp[(1/C_r)·NTU^0.22·(exp(−C_r·NTU^0.78) − 1)], NTU = NTU₁ / min(r, 1), C_r = min(r, 1/r), ε_hx = ε·min(r, 1)</Equation>
    </>
  ),
  'water-side': (
    <>
      <p>
        <strong>Water-side economiser</strong>: with a cooling tower, free when T_wb + approach ≤ T_chws, else mechanical (below the freeze-protection wet-bulb
        the tower runs dry and approaches the dry-bulb, with its basin heaters on); with a dry cooler, free when T + approach ≤ T_chws, adiabatic assist when
        the wetted cooler reaches it, else mechanical.
      </p>
      <Equation>T_water = T_wb + approach (tower) · T + approach (dry) · T − ε·(T − T_wb) + approach (wetted)</Equation>
    </>
  ),
  hybrid: (
    <>
      <p>
        <strong>Hybrid hall</strong>: a share s of the IT heat goes to a liquid loop (cold plates, coolant distribution units, facility water at T_fws), the
        rest to the hall air. The liquid loop is classified by the water-side rule with its facility-water supply as T_chws; the air loop by the rule of its own
        kind; each carries its share of the IT load (the liquid loop has no hall fans). The hour's mode is the more demanding of the loops that carry load
        (mechanical, then adiabatic assist, then free cooling); energy and water are the loops' sums, and pPUE and WUE are over the whole hall. Coolant supply
        to the IT = T_fws + CDU approach.
      </p>
      <Equation>mode = max(mode_liquid, mode_air) E = E_liquid + E_air P_IT,liquid = s·P_IT, P_IT,air = (1 − s)·P_IT</Equation>
      <Equation>ERF = E_reused / E_data centre (ISO/IEC 30134-6) COP_heat pump = COP_cooling(lift) + 1</Equation>
    </>
  ),
};

type SystemKind = ReportRun['scenario']['system']['kind'];

/** The classification rules a run uses: its own kind's, and for a hybrid also its loops'. */
function kindsOf(system: ReportRun['scenario']['system']): SystemKind[] {
  return system.kind === 'hybrid' ? ['hybrid', 'water-side', system.air.kind] : [system.kind];
}

/** The energy and water model of engine 2.0.0 (README "How it works", "Energy per hour" and "Water per hour"). */
function EnergyAndWater() {
  return (
    <>
      <p>
        IT load P_IT = L·P_design, L from the scenario's load profile (constant, a ramp by year, or an hourly profile). Hall fan heat is derived from the fan
        power, f = P_fan / (ṁ·c_p) with ṁ = P_IT / (c_p·ΔT), c_p = 1.006 kJ/(kg·K) (eq. 32, dry air). Fans and pumps follow the load by the affinity laws (power
        ∝ speed³, with a minimum speed). Compressors carry the mechanical fraction f_mech of the cooling load Q = P_IT + P_fan at a COP that follows their lift:
        a fixed fraction η of the Carnot COP between the evaporating temperature (leaving air or chilled water less an approach) and the condensing temperature
        (outdoor dry-bulb or pre-cooled air for air-cooled condensers; tower or dry-cooler water for water-cooled ones, plus an approach). η is calibrated so
        the COP equals the rated COP at the AHRI 550/590 rating conditions (6.7 °C leaving water with 35 °C air or 29.4 °C condenser water; recalled from
        memory); the lift is never taken below 10 K. Part load follows a quadratic curve with cycling below the minimum turndown (common practice in form;
        illustrative coefficients).
      </p>
      <Equation>f = P_fan,design / (ṁ·c_p) = fanPowerFraction·ΔT P_fan = fanPowerFraction·P_design·max(L, N_min)³</Equation>
      <Equation>COP = η·T_evap / (T_cond − T_evap) (K) P_comp = (Q_design / COP)·EIR(PLR), EIR = 0.2 + 0.2·PLR + 0.6·PLR²</Equation>
      <p>
        Water is reported in two parts: humidification (the stage only adds moisture) and evaporative cooling (stages, wetted condensers and coolers, towers
        that cool). An air-side stage takes up ṁ_stage·(W_out − W_in). A tower's air leaves saturated (Merkel's assumption) after gaining (L/G)·c_w·R of
        enthalpy per kg (L/G = 1.2, R = 5.6 K, common practice), so its evaporation follows the weather; below the freeze-protection wet-bulb it runs dry. Drift
        is a share of the circulating water; blowdown follows the cycles of concentration.
      </p>
      <Equation>Δh_air = (L/G)·c_w·R, m_evap = ṁ_air·(W_s(t_out) − W), ṁ_air = Q_rej / Δh_air, Q_rej = Q + P_comp</Equation>
      <Equation>B = E / (C − 1) − D (cycles of concentration C, evaporation E, drift D)</Equation>
    </>
  );
}

/** The energy model of scenario-engine 1.0.0, for reports on runs it made. */
function EnergyAndWaterOfEngine1() {
  return (
    <>
      <p>
        Runs made by scenario-engine 1.0.0 used its earlier model: a fan heat typed as an input; compressors at a COP varying linearly with the outdoor dry-bulb
        (common practice for screening, not a chiller curve); fans every hour at full power; towers evaporating a fixed share of the rejected heat over h_fg ≈
        2430 kJ/kg (common practice, recalled from memory); humidifying hours counted as adiabatic assist; blowdown as a ratio of the evaporated water.
      </p>
      <Equation>P_comp = f_mech·Q / COP(T), COP(T) = max(COP_min, COP_ref + slope·(T − T_ref))</Equation>
    </>
  );
}

const ENGINE_1 = 'scenario-engine 1.0.0';

/** How the figures were computed, with the equations and their sources (README "How it works"). */
export function MethodSection({ runs }: { runs: ReportRun[] }) {
  const kinds = [...new Set(runs.flatMap((r) => kindsOf(r.scenario.system)))];
  const engines = [...new Set(runs.map((r) => r.engineVersion))];
  return (
    <div className="space-y-3 text-sm leading-relaxed" data-testid="report-method">
      <p>
        Every hour of the climate file is classified on its own, then the hours are summed. Hours without usable data are counted as no data, never guessed.
        Engine version {engines.join(', ')}.
      </p>
      <SubHeading>Moist air at the site's pressure</SubHeading>
      <p>
        ASHRAE Handbook—Fundamentals (2017), chapter 1: saturation pressure by Hyland–Wexler; relative humidity and dew point over liquid water at every
        temperature, as weather data state them (WMO-No. 8; eq. 6 extended below 0 °C), eq. 5 over ice only for the wet-bulb's ice branch and the frost point;
        station pressure from the file, or the standard atmosphere at the site elevation (eq. 3); humidity ratio, relative humidity and dew point (eq. 20, 22,
        36); enthalpy (eq. 32); thermodynamic wet-bulb solved from the psychrometric equation (eq. 33 over water, eq. 35 over ice), taking the root over liquid
        water where two exist near 0 °C.
      </p>
      <Equation>p = 101.325 kPa · (1 − 2.25577·10⁻⁵·Z)^5.2559</Equation>
      <Equation>W = 0.621945 · p_w / (p − p_w) h = 1.006·t + W·(2501 + 1.86·t) kJ/kg dry air</Equation>
      <Equation>W = ((2501 − 2.326·t*)·W_s* − 1.006·(t − t*)) / (2501 + 1.86·t − 4.186·t*)</Equation>
      <SubHeading>Inlet envelope</SubHeading>
      <p>
        Limits from ASHRAE TC 9.9, Thermal Guidelines for Data Processing Environments (edition named with the envelope). The highest dry-bulb is derated with
        altitude: T_max,site = T_max − max(0, Z − Z₀)/m. Supply moisture limits at the hour's pressure: W_hi = min(W(dew point max), W(T_s, RH max)); W_lo =
        max(W(dew point min), W(T_s, RH min)).
      </p>
      <SubHeading>Classifying each hour</SubHeading>
      <p className="text-ink-soft">
        T outdoor dry-bulb, W humidity ratio, T_wb wet-bulb, T_s supply setpoint, f fan heat, ΔT rise across the IT, T_r = T_s + ΔT return, ε evaporative
        effectiveness.
      </p>
      {kinds.map((kind) => (
        <div key={kind}>{classification[kind]}</div>
      ))}
      <SubHeading>Energy and water per hour</SubHeading>
      {engines.some((e) => e !== ENGINE_1) && <EnergyAndWater />}
      {engines.includes(ENGINE_1) && <EnergyAndWaterOfEngine1 />}
      <Equation>pPUE = (E_IT + E_fans + E_compressors + E_pumps + E_basin heaters) / E_IT (partial PUE of the cooling subsystem, ISO/IEC 30134-2)</Equation>
      <Equation>WUE = site water use (L) / IT energy (kWh) (ISO/IEC 30134-9)</Equation>
      <p className="text-ink-soft">
        Energy and water are summed over the hours with data; "per 8,760 h" scales those sums to a year of hours with data so files of different lengths
        compare.
      </p>
      <div className="keep-together">
        <SubHeading>Sources</SubHeading>
        <ul className="list-disc space-y-0.5 pl-5">
          <li>ASHRAE Handbook—Fundamentals (2017), chapter 1, Psychrometrics.</li>
          <li>ASHRAE TC 9.9, Thermal Guidelines for Data Processing Environments, 5th edition (2021) and 4th edition (2015).</li>
          <li>ISO/IEC 30134-2 (power usage effectiveness), ISO/IEC 30134-6 (energy reuse factor) and ISO/IEC 30134-9 (water usage effectiveness).</li>
          <li>WMO-No. 8, Guide to Instruments and Methods of Observation, part I ch. 4 (humidity over liquid water).</li>
          <li>Incropera, DeWitt, Bergman and Lavine, Fundamentals of Heat and Mass Transfer (ε-NTU); Çengel and Boles, Thermodynamics (Carnot COP).</li>
          <li>AHRI Standard 550/590 (rating conditions); ASHRAE Handbook—HVAC Systems and Equipment (fans, cooling towers).</li>
        </ul>
      </div>
    </div>
  );
}

/** What the model leaves out, beside the product's cautions. */
export function ModelLimits() {
  return (
    <p className="text-sm text-ink-soft">
      Not modelled: latent loads inside the hall, minimum outdoor air and coil condensation at the supply temperature. The classifier takes the design fan heat
      at every load; the exchanger's UA is held at its rating; the compressor curve is a Carnot fraction with an illustrative part-load shape, not a
      manufacturer's map; the tower model assumes saturated leaving air and a fixed range and L/G.
    </p>
  );
}
