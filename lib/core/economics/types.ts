/**
 * Types of the fouling-economics core.
 *
 * Units: power in W, energy in J inside, durations in days (1 day = 86 400 s; every price the plant quotes is per
 * day, per GJ or per tonne, and the planner works in whole weeks), money as plain numbers in the site currency
 * (no rounding inside the core; round only for display). A "cost rate" is money per day.
 */

/** Fuel and carbon prices and the furnace that makes up the lost preheat. */
export interface EnergyPrices {
  /** Fuel price per GJ of fuel energy, on the same heating-value basis as the efficiency (normally LHV). */
  fuelPricePerGJ: number;
  /** Fired-heater efficiency, fraction in (0, 1]: fuel energy = duty made up at the furnace / efficiency. */
  heaterEfficiency: number;
  /** CO2 emitted per GJ of fuel energy, kg/GJ (natural gas about 56.1 kg/GJ on LHV, IPCC 2006 default). */
  co2KgPerGJFuel: number;
  /** Price of emitting one tonne (1000 kg) of CO2; 0 where carbon is not priced. */
  co2PricePerTonne: number;
}

/** A way of cleaning an exchanger (hydro-blasting, chemical, bundle pull ...) with its direct cost and outage. */
export interface CleaningMethod {
  name: string;
  /** Direct cost of one cleaning (contractor, materials, waste, scaffolding), site currency. */
  cost: number;
  /** Days the exchanger is isolated from the process for one cleaning, > 0. */
  outageDays: number;
}

/**
 * Production lost because the exchanger limits throughput once it has lost this much duty (a hydraulic or
 * furnace-firing limit), charged per day while the duty loss is above the limit.
 */
export interface ThroughputLimit {
  /** Duty loss above which throughput is cut, W (i.e. clean duty minus the hard duty limit). */
  dutyLossW: number;
  /** Lost margin per day while limited, site currency per day. */
  lostProductionPerDay: number;
}

/** Everything that turns one exchanger's duty loss into money. */
export interface AssetEconomics {
  energy: EnergyPrices;
  method: CleaningMethod;
  /**
   * Lost production margin per day while the exchanger is out for cleaning outside a turnaround window (0 when a
   * bypass keeps the plant at full rate), site currency per day.
   */
  outageLostProductionPerDay: number;
  /**
   * Duty lost while the exchanger is bypassed for cleaning (normally its clean duty), made up at the furnace, W;
   * charged outside turnaround windows only. Default 0.
   */
  bypassDutyLossW?: number;
  /** Optional throughput limit; null or absent when fouling never limits the plant. */
  throughputLimit?: ThroughputLimit | null;
}

/**
 * Fouling forecast of one cycle expressed as lost duty. The fouling assessment supplies it (from a fitted Rf model
 * and a rating curve, see dutyLossFromResistance, or a sampled series, see sampledDutyLoss).
 */
export interface DutyLossForecast {
  /**
   * Duty lost to fouling at `elapsedDays` since the exchanger returned to service, W: clean duty minus the duty
   * the fouled exchanger delivers at reference conditions. Finite and non-negative; the optimisers assume it
   * does not decrease with time (every fouling curve in Epstein's classification is non-decreasing).
   */
  dutyLossW(elapsedDays: number): number;
  /**
   * Optional exact ∫ ΔQ dt between two ages, W·days. Supply it when it is cheap and exact (a sampled series is
   * piecewise linear); otherwise the cost integrals use adaptive Simpson quadrature on dutyLossW.
   */
  dutyLossIntegralWDays?(fromDays: number, toDays: number): number;
}

/** Result of {@link optimalCleaningInterval}. */
export interface OptimalCleaningInterval {
  /**
   * "optimum": an interior minimum of J(τ) with c(τ*) = J(τ*);
   * "no-optimum-within-maximum": J(τ) still falls at the maximum cycle (cleaning does not pay within it,
   * e.g. asymptotic fouling with C ≥ b·Rf∞·θ); the maximum is returned;
   * "at-minimum": J(τ) rises from the shortest cycle allowed (the loss right after cleaning already exceeds the
   * average cost); the minimum is returned.
   */
  status: "optimum" | "no-optimum-within-maximum" | "at-minimum";
  /** τ*, days in service between cleanings (downtime excluded). */
  intervalDays: number;
  /** J(τ*), mean cost per day over a full cycle (service + downtime), site currency per day. */
  averageCostPerDay: number;
  /** c(τ*), fouling cost rate at the end of the cycle, per day. */
  costRateAtIntervalPerDay: number;
  /** C, cost of one cleaning event including its outage, site currency. */
  eventCost: number;
  /** ∫₀^τ* c(t) dt, fouling cost over one cycle, site currency. */
  cycleFoulingCost: number;
  /** Downtime per cycle used in the denominator, days. */
  downtimeDays: number;
}

/** One point of a fouling-cost projection, see {@link foulingCostSummary}. */
export interface FoulingCostPoint {
  /** Days after "now". */
  daysFromNow: number;
  /** Days since return to service at that point. */
  elapsedDays: number;
  /** Fouling cost rate then, per day. */
  costPerDay: number;
  /** Fouling cost from now to then. */
  costFromNow: number;
  /** Fouling cost from the start of the cycle to then. */
  cycleCostToDate: number;
}

/** Result of {@link foulingCostSummary}. */
export interface FoulingCostSummary {
  /** Days since return to service now. */
  elapsedDays: number;
  /** Duty lost now, W. */
  dutyLossW: number;
  /** Fouling cost rate now, per day (energy + CO2 + throughput loss). */
  costPerDay: number;
  /** Of which fuel and CO2, per day. */
  energyCostPerDay: number;
  /** Of which lost production at the throughput limit, per day. */
  lostProductionPerDay: number;
  /** Extra fuel burnt now, GJ per day. */
  fuelGJPerDay: number;
  /** Extra CO2 emitted now, tonnes per day. */
  co2TonnesPerDay: number;
  /** Fouling cost since the cycle started. */
  cycleCostToDate: number;
  projection: FoulingCostPoint[];
}
