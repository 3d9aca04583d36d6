import type { ModelData } from "highs";
import { candidateStartWeeks } from "./candidate-start-weeks";
import { deadlineMiss, type DeadlineMiss } from "./deadline-miss";
import type { PlanOccupancy } from "./plan-occupancy";
import { scheduleCost } from "./schedule-cost";
import type { InstanceAsset, PlanningInstance } from "./types";

/** What the model is built for. */
export interface ScheduleModelSpec {
  /** hard: the first cleaning must start by the deadline; soft: misses are counted instead (deadlineMiss). */
  deadlines: "hard" | "soft";
  /**
   * cost: minimise the plan cost; lateness: minimise M·(assets that miss) + (total weeks late) with
   * M = assets·W + 1, which exceeds any total of weeks late, so fewer misses always win (lexicographic order).
   */
  objective: "cost" | "lateness";
  /** With soft deadlines: at most this many misses and weeks late in total. */
  latenessLimit?: DeadlineMiss;
}

/** A built model with what is needed to read its solution. */
export interface ScheduleModel {
  model: ModelData;
  /** Constant to add to the model objective (the no-cleaning cost or lateness of every asset). */
  objectiveOffset: number;
  /** Start weeks per asset id from a primal solution (values > 0.5 taken as 1). */
  decode(columnValues: ArrayLike<number>): Record<string, number[]>;
  /** Column values of a schedule (assets not listed: no cleaning), for a MIP start; null if a schedule has no column. */
  encode(startWeeks: Readonly<Record<string, readonly number[]>>): Float64Array | null;
  /**
   * A feasible schedule guided by a fractional (LP relaxation) solution, keeping the given schedules of some assets
   * as they are, or null if the greedy repair fails (see buildScheduleModel).
   */
  round(columnValues: ArrayLike<number>, keep?: Readonly<Record<string, readonly number[]>>): Record<string, number[]> | null;
}

/** One binary column: a single-cleaning choice, or an arc of a multi-cleaning asset's path. */
interface Column {
  asset: number;
  cost: number;
  /** Change of misses and weeks late against no cleaning. */
  missed: number;
  weeksLate: number;
  /** Week in which the cleaning this column switches on starts, or null (arcs into the horizon end). */
  start: number | null;
  /** Whether that cleaning is locked (its load is already accounted for). */
  startLocked: boolean;
  /** Arc tail and head: -1 = source (running cycle), W = horizon end; single-cleaning columns: -1 → start. */
  tail: number;
  head: number;
}

const SOURCE = -1;

/**
 * buildScheduleModel: the cleaning schedule as a binary programme (HiGHS ModelData, rows in CSR form).
 *
 * Variables: single-cleaning assets have x[a,w] ∈ {0,1} per candidate start week (no column = no cleaning, whose
 * cost is the offset); multi-cleaning assets have path arcs y[a,u→w] (source → w, u → w with w − u >= spacing,
 * w → end, source → end), so the cost of any schedule is the sum of its arcs (scheduleCost).
 * Constraints: Σ_w x[a,w] <= 1 (= 1 with a hard deadline, over w <= deadline); flow balance, one path, at most K
 * cleanings and every lock visited for multi-cleaning assets; crew capacity Σ cleanings in progress in week t <=
 * capacity[t] − locked load[t]; group rows Σ members out in week t <= 1; optional limits on the number of missed
 * deadlines and on the total weeks late.
 * Columns are only created for candidate weeks (candidateStartWeeks), which encodes blackouts, earliest weeks and
 * weeks taken by locks. Rows that cannot bind are left out.
 *
 * @param instance planning instance
 * @param locked lockedOccupancy(instance)
 * @param spec deadlines, objective and lateness limit
 */
export function buildScheduleModel(instance: PlanningInstance, locked: PlanOccupancy, spec: ScheduleModelSpec): ScheduleModel {
  const weeks = instance.weeks;
  const columns: Column[] = [];
  const rows: { lower: number; upper: number; entries: Map<number, number> }[] = [];
  let costOffset = 0;
  const missOffset: DeadlineMiss = { missed: 0, weeksLate: 0 };
  const addMiss = (miss: DeadlineMiss): void => {
    missOffset.missed += miss.missed;
    missOffset.weeksLate += miss.weeksLate;
  };
  const missWeight = instance.assets.length * weeks + 1;
  const fixedSchedules: Record<string, number[]> = {};
  const singleColumnsOf: number[][] = instance.assets.map(() => []);
  const pathColumnsOf: number[][] = instance.assets.map(() => []);

  const addRow = (lower: number, upper: number, entries: Iterable<number>): void => {
    const map = new Map<number, number>();
    for (const column of entries) map.set(column, (map.get(column) ?? 0) + 1);
    rows.push({ lower, upper, entries: map });
  };

  instance.assets.forEach((asset: InstanceAsset, assetIndex) => {
    const costs = asset.costs;
    const none = scheduleCost(costs, weeks, []);
    const noneMiss = deadlineMiss(asset.deadlineWeek, weeks, null);
    const missChange = (firstStart: number) => {
      const miss = deadlineMiss(asset.deadlineWeek, weeks, firstStart);
      return { missed: miss.missed - noneMiss.missed, weeksLate: miss.weeksLate - noneMiss.weeksLate };
    };
    const candidates = candidateStartWeeks(instance, asset, locked);
    const hardDeadline = spec.deadlines === "hard" ? asset.deadlineWeek : null;

    if (asset.maximumCleanings === 1 || (asset.lockedWeeks.length > 0 && asset.lockedWeeks.length === asset.maximumCleanings)) {
      if (asset.lockedWeeks.length > 0) {
        const schedule = [...asset.lockedWeeks];
        fixedSchedules[asset.id] = schedule;
        costOffset += scheduleCost(costs, weeks, schedule);
        addMiss(deadlineMiss(asset.deadlineWeek, weeks, schedule[0] ?? null));
        return;
      }
      costOffset += none;
      addMiss(noneMiss);
      const own: number[] = [];
      for (const start of candidates) {
        if (hardDeadline !== null && start > hardDeadline) continue;
        own.push(columns.length);
        columns.push({
          asset: assetIndex,
          cost: scheduleCost(costs, weeks, [start]) - none,
          ...missChange(start),
          start,
          startLocked: false,
          tail: SOURCE,
          head: start,
        });
      }
      singleColumnsOf[assetIndex] = own;
      if (hardDeadline !== null) addRow(1, 1, own);
      else if (own.length > 1) addRow(-Infinity, 1, own);
      return;
    }

    // Multi-cleaning asset: a path from the source through its cleanings to the horizon end.
    costOffset += none;
    addMiss(noneMiss);
    const locks = new Set(asset.lockedWeeks);
    const nodes = [...new Set([...candidates, ...asset.lockedWeeks])].sort((a, b) => a - b);
    const lockBetween = (from: number, to: number): boolean => asset.lockedWeeks.some((lock) => lock > from && lock < to);
    const own: number[] = [];
    const add = (tail: number, head: number, cost: number, miss: DeadlineMiss): void => {
      own.push(columns.length);
      columns.push({
        asset: assetIndex,
        cost,
        ...miss,
        start: head === weeks ? null : head,
        startLocked: locks.has(head),
        tail,
        head,
      });
    };
    const noChange: DeadlineMiss = { missed: 0, weeksLate: 0 };
    if (locks.size === 0 && hardDeadline === null) add(SOURCE, weeks, 0, noChange);
    for (const node of nodes) {
      if (!lockBetween(-Infinity, node) && (hardDeadline === null || node <= hardDeadline)) {
        add(
          SOURCE,
          node,
          (costs.currentCycle[node] as number) + (costs.event[node] as number) - none,
          missChange(node),
        );
      }
      for (const next of nodes) {
        if (next - node < asset.spacingWeeks || lockBetween(node, next)) continue;
        add(node, next, (costs.newCycle[next - node] as number) + (costs.event[next] as number), noChange);
      }
      if (!lockBetween(node, Infinity)) {
        add(node, weeks, (costs.newCycle[weeks - node] as number) + (costs.newEndCharge[weeks - node] as number), noChange);
      }
    }
    pathColumnsOf[assetIndex] = own;
    const outOf = (node: number) => own.filter((column) => (columns[column] as Column).tail === node);
    const into = (node: number) => own.filter((column) => (columns[column] as Column).head === node);
    addRow(1, 1, outOf(SOURCE));
    for (const node of nodes) {
      const entries = new Map<number, number>();
      for (const column of into(node)) entries.set(column, 1);
      for (const column of outOf(node)) entries.set(column, (entries.get(column) ?? 0) - 1);
      rows.push({ lower: 0, upper: 0, entries });
      if (locks.has(node)) addRow(1, 1, into(node));
    }
    addRow(-Infinity, asset.maximumCleanings, own.filter((column) => (columns[column] as Column).head !== weeks));
  });

  // Crew capacity and group rows over the columns that switch on an unlocked cleaning.
  const covering: number[][] = Array.from({ length: weeks }, () => []);
  columns.forEach((column, index) => {
    if (column.start === null || column.startLocked) return;
    const asset = instance.assets[column.asset] as InstanceAsset;
    for (let week = column.start; week < Math.min(weeks, column.start + asset.durationWeeks); week += 1) {
      (covering[week] as number[]).push(index);
    }
  });
  const distinctAssets = (indices: readonly number[]): number => new Set(indices.map((index) => (columns[index] as Column).asset)).size;
  covering.forEach((indices, week) => {
    const room = (instance.crewCapacity[week] as number) - (locked.load[week] as number);
    if (distinctAssets(indices) > room) addRow(-Infinity, Math.max(0, room), indices);
  });
  const assetIndexById = new Map(instance.assets.map((asset, index) => [asset.id, index]));
  for (const group of instance.groups) {
    const members = new Set(group.assetIds.map((id) => assetIndexById.get(id)).filter((index) => index !== undefined));
    if (members.size < 2) continue;
    covering.forEach((indices) => {
      const inGroup = indices.filter((index) => members.has((columns[index] as Column).asset));
      if (distinctAssets(inGroup) > 1) addRow(-Infinity, 1, inGroup);
    });
  }
  const limit = spec.latenessLimit;
  if (spec.deadlines === "soft" && limit !== undefined) {
    const missedEntries = new Map<number, number>();
    const weeksEntries = new Map<number, number>();
    columns.forEach((column, index) => {
      if (column.missed !== 0) missedEntries.set(index, column.missed);
      if (column.weeksLate !== 0) weeksEntries.set(index, column.weeksLate);
    });
    rows.push({ lower: -Infinity, upper: limit.missed - missOffset.missed + 1e-6, entries: missedEntries });
    rows.push({ lower: -Infinity, upper: limit.weeksLate - missOffset.weeksLate + 1e-6, entries: weeksEntries });
  }

  // CSR assembly.
  const starts: number[] = [0];
  const indices: number[] = [];
  const values: number[] = [];
  for (const row of rows) {
    const sorted = [...row.entries.entries()].filter(([, value]) => value !== 0).sort((a, b) => a[0] - b[0]);
    for (const [column, value] of sorted) {
      indices.push(column);
      values.push(value);
    }
    starts.push(indices.length);
  }
  const model: ModelData = {
    numCols: columns.length,
    numRows: rows.length,
    colCost: columns.map((column) => (spec.objective === "cost" ? column.cost : missWeight * column.missed + column.weeksLate)),
    colLower: columns.map(() => 0),
    colUpper: columns.map(() => 1),
    rowLower: rows.map((row) => row.lower),
    rowUpper: rows.map((row) => row.upper),
    matrix: { format: "csr", numRows: rows.length, numCols: columns.length, starts, indices, values },
    integrality: columns.map(() => 1 as const),
  };

  const decode = (columnValues: ArrayLike<number>): Record<string, number[]> => {
    const result: Record<string, number[]> = {};
    instance.assets.forEach((asset, assetIndex) => {
      const fixed = fixedSchedules[asset.id];
      if (fixed) {
        result[asset.id] = [...fixed];
        return;
      }
      const chosen = (list: readonly number[]) => list.filter((index) => (columnValues[index] ?? 0) > 0.5);
      if (asset.maximumCleanings === 1) {
        result[asset.id] = chosen(singleColumnsOf[assetIndex] as number[]).map((index) => (columns[index] as Column).head);
        return;
      }
      const arcs = chosen(pathColumnsOf[assetIndex] as number[]).map((index) => columns[index] as Column);
      const schedule: number[] = [];
      let node = SOURCE;
      for (let step = 0; step <= weeks + 1; step += 1) {
        const arc = arcs.find((candidate) => candidate.tail === node);
        if (!arc || arc.head === weeks) break;
        schedule.push(arc.head);
        node = arc.head;
      }
      result[asset.id] = schedule;
    });
    return result;
  };

  const encode = (startWeeks: Readonly<Record<string, readonly number[]>>): Float64Array | null => {
    const values = new Float64Array(columns.length);
    for (const [assetIndex, asset] of instance.assets.entries()) {
      if (fixedSchedules[asset.id]) continue;
      const schedule = startWeeks[asset.id] ?? [];
      if (asset.maximumCleanings === 1) {
        if (schedule.length === 0) continue;
        const column = (singleColumnsOf[assetIndex] as number[]).find((index) => (columns[index] as Column).head === schedule[0]);
        if (column === undefined) return null;
        values[column] = 1;
        continue;
      }
      const nodes = [SOURCE, ...schedule, weeks];
      for (let step = 0; step + 1 < nodes.length; step += 1) {
        const column = (pathColumnsOf[assetIndex] as number[]).find(
          (index) => (columns[index] as Column).tail === nodes[step] && (columns[index] as Column).head === nodes[step + 1],
        );
        if (column === undefined) return null;
        values[column] = 1;
      }
    }
    return values;
  };

  // LP-guided rounding: assets with a deadline first (earliest deadline first), then the others by how firmly the
  // relaxation decides them; each takes the option with the largest relaxation weight that still fits (crews, groups),
  // then any fitting column by cost, then no cleaning where allowed.
  const mates = new Map<string, Set<string>>();
  for (const group of instance.groups) {
    for (const id of group.assetIds) {
      const set = mates.get(id) ?? new Set<string>();
      for (const other of group.assetIds) if (other !== id) set.add(other);
      mates.set(id, set);
    }
  }
  const round = (
    columnValues: ArrayLike<number>,
    keep: Readonly<Record<string, readonly number[]>> = {},
  ): Record<string, number[]> | null => {
    const load = [...locked.load];
    const out = locked.outByWeek.map((ids) => new Set(ids));
    const schedule: Record<string, number[]> = {};
    const value = (index: number): number => columnValues[index] ?? 0;
    const fits = (asset: InstanceAsset, starts: readonly number[]): boolean => {
      const own = mates.get(asset.id) ?? new Set<string>();
      for (const start of starts) {
        if (asset.lockedWeeks.includes(start)) continue;
        for (let week = start; week < Math.min(weeks, start + asset.durationWeeks); week += 1) {
          if ((load[week] as number) >= (instance.crewCapacity[week] as number)) return false;
          for (const id of out[week] as Set<string>) if (own.has(id)) return false;
        }
      }
      return true;
    };
    const take = (asset: InstanceAsset, starts: readonly number[]): void => {
      for (const start of starts) {
        if (asset.lockedWeeks.includes(start)) continue;
        for (let week = start; week < Math.min(weeks, start + asset.durationWeeks); week += 1) {
          load[week] = (load[week] as number) + 1;
          (out[week] as Set<string>).add(asset.id);
        }
      }
      schedule[asset.id] = [...starts];
    };
    type Option = { starts: number[]; weight: number; cost: number };
    const optionsOf = (assetIndex: number): { options: Option[]; noneAllowed: boolean } => {
      const asset = instance.assets[assetIndex] as InstanceAsset;
      if (asset.maximumCleanings === 1) {
        const own = singleColumnsOf[assetIndex] as number[];
        const options = own.map((index) => {
          const column = columns[index] as Column;
          return { starts: [column.head], weight: value(index), cost: column.cost };
        });
        const noneAllowed = !(spec.deadlines === "hard" && asset.deadlineWeek !== null);
        if (noneAllowed) options.push({ starts: [], weight: 1 - options.reduce((sum, option) => sum + option.weight, 0), cost: 0 });
        return { options, noneAllowed };
      }
      const own = (pathColumnsOf[assetIndex] as number[]).map((index) => ({ index, column: columns[index] as Column }));
      const path: number[] = [];
      let node = SOURCE;
      let weight = Infinity;
      let cost = 0;
      let complete = false;
      for (let step = 0; step <= weeks + 1; step += 1) {
        const full = path.length === asset.maximumCleanings;
        const next = own
          .filter((arc) => arc.column.tail === node && (!full || arc.column.head === weeks))
          .sort((a, b) => value(b.index) - value(a.index))[0];
        if (!next) break;
        weight = Math.min(weight, value(next.index));
        cost += next.column.cost;
        if (next.column.head === weeks) {
          complete = true;
          break;
        }
        path.push(next.column.head);
        node = next.column.head;
      }
      const options: Option[] = complete ? [{ starts: path, weight, cost }] : [];
      const direct = own.find((arc) => arc.column.tail === SOURCE && arc.column.head === weeks);
      if (direct) options.push({ starts: [], weight: value(direct.index), cost: 0 });
      return { options, noneAllowed: direct !== undefined };
    };
    const entries = instance.assets.map((asset, assetIndex) => ({ asset, assetIndex, ...optionsOf(assetIndex) }));
    for (const entry of entries) {
      const given = fixedSchedules[entry.asset.id] ?? keep[entry.asset.id];
      if (given) take(entry.asset, given);
    }
    const firmness = (entry: (typeof entries)[number]) => Math.max(0, ...entry.options.map((option) => option.weight));
    const order = entries
      .filter((entry) => !fixedSchedules[entry.asset.id] && !keep[entry.asset.id])
      .sort((a, b) => {
        const aDeadline = a.asset.deadlineWeek ?? Infinity;
        const bDeadline = b.asset.deadlineWeek ?? Infinity;
        return aDeadline - bDeadline || firmness(b) - firmness(a) || a.assetIndex - b.assetIndex;
      });
    for (const entry of order) {
      const byWeight = [...entry.options].sort((a, b) => b.weight - a.weight || a.cost - b.cost);
      const byCost = [...entry.options].sort((a, b) => a.cost - b.cost);
      const choice =
        byWeight.find((option) => option.weight > 1e-6 && fits(entry.asset, option.starts)) ??
        byCost.find((option) => fits(entry.asset, option.starts));
      if (!choice) return null;
      take(entry.asset, choice.starts);
    }
    if (spec.deadlines === "soft" && limit !== undefined) {
      const total = { missed: 0, weeksLate: 0 };
      for (const asset of instance.assets) {
        const miss = deadlineMiss(asset.deadlineWeek, weeks, schedule[asset.id]?.[0] ?? null);
        total.missed += miss.missed;
        total.weeksLate += miss.weeksLate;
      }
      if (total.missed > limit.missed || total.weeksLate > limit.weeksLate) return null;
    }
    return schedule;
  };

  return {
    model,
    objectiveOffset: spec.objective === "cost" ? costOffset : missWeight * missOffset.missed + missOffset.weeksLate,
    decode,
    encode,
    round,
  };
}
