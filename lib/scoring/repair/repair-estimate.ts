import { bandRank } from '../grading/bands';
import { money, type Money } from '../money';
import type { CheckResult } from '../result';
import type { RepairAction, RepairCostCatalogue, RepairRule } from './cost-catalogue';

export interface RepairLine {
  actionId: string;
  label: string;
  cost: Money;
  triggeredBy: string[];
  /**
   * set-up-and-service: every check calling for it is a set-up or service item (an adjustment, an
   * oil change); repair: wear or damage. The valuation may treat the two apart.
   */
  kind: 'set-up-and-service' | 'repair';
}

export interface RepairEstimate {
  catalogueId: string;
  lines: RepairLine[];
  total: Money;
  /** Sum of the set-up and service lines. */
  setUpAndServiceTotal: Money;
  /** Sum of the wear and damage repair lines. */
  repairTotal: Money;
  explanation: string;
}

interface CatalogueIndex {
  /** Each check's rules, with the rank of the band each starts from (bandRank, worked out once). */
  rulesByCheck: Map<string, { rule: RepairRule; fromRank: number }[]>;
  actionsById: Map<string, RepairAction>;
}

/** Catalogues are plain data looked up on every scoring; index each one once. */
const INDEXES = new WeakMap<RepairCostCatalogue, CatalogueIndex>();

function indexOf(catalogue: RepairCostCatalogue): CatalogueIndex {
  let index = INDEXES.get(catalogue);
  if (!index) {
    const rulesByCheck: CatalogueIndex['rulesByCheck'] = new Map();
    for (const rule of catalogue.rules) {
      const ranked = { rule, fromRank: bandRank(rule.fromBand) };
      const list = rulesByCheck.get(rule.checkId);
      if (list) list.push(ranked);
      else rulesByCheck.set(rule.checkId, [ranked]);
    }
    index = { rulesByCheck, actionsById: new Map(catalogue.actions.map((a) => [a.id, a])) };
    INDEXES.set(catalogue, index);
  }
  return index;
}

/**
 * Map each measured check to the most severe repair its band reaches in the catalogue, merge
 * checks calling for the same action, drop actions superseded by a heavier one, and total.
 */
export function estimateRepairs(checks: readonly CheckResult[], catalogue: RepairCostCatalogue): RepairEstimate {
  const { rulesByCheck, actionsById } = indexOf(catalogue);
  const triggered = new Map<string, string[]>();
  const conditionChecks = new Set<string>();
  for (const check of checks) {
    if (check.nature === 'condition') conditionChecks.add(check.id);
    if (check.status !== 'measured' || check.band === null) continue;
    const rules = rulesByCheck.get(check.id);
    if (!rules) continue;
    const reachedRank = bandRank(check.band);
    // The most severe band among the rules this check's band reaches; every rule from that band applies.
    let mostSevere = Number.NEGATIVE_INFINITY;
    for (const { fromRank } of rules) {
      if (fromRank <= reachedRank && fromRank > mostSevere) mostSevere = fromRank;
    }
    for (const { rule, fromRank } of rules) {
      if (fromRank !== mostSevere) continue;
      const by = triggered.get(rule.actionId);
      if (by) by.push(check.id);
      else triggered.set(rule.actionId, [check.id]);
    }
  }
  const superseded = new Set<string>();
  for (const actionId of triggered.keys()) {
    for (const s of actionsById.get(actionId)?.supersedes ?? []) superseded.add(s);
  }
  const lines: RepairLine[] = [];
  let totalMinor = 0;
  let setUpMinor = 0;
  for (const a of catalogue.actions) {
    const by = triggered.get(a.id);
    if (!by || superseded.has(a.id)) continue;
    const cost = money(a.costMinor, catalogue.currency);
    totalMinor += cost.amountMinor;
    const kind = by.some((id) => conditionChecks.has(id)) ? 'repair' : 'set-up-and-service';
    if (kind === 'set-up-and-service') setUpMinor += cost.amountMinor;
    lines.push({ actionId: a.id, label: a.label, cost, triggeredBy: by, kind });
  }
  const total = money(totalMinor, catalogue.currency);
  const setUpAndServiceTotal = money(setUpMinor, catalogue.currency);
  const repairTotal = money(totalMinor - setUpMinor, catalogue.currency);
  const droppedText = [...superseded].filter((id) => triggered.has(id));
  return {
    catalogueId: catalogue.id,
    lines,
    total,
    setUpAndServiceTotal,
    repairTotal,
    explanation: lines.length
      ? `${lines.length} repair actions from catalogue "${catalogue.id}"${droppedText.length ? `; ${droppedText.join(', ')} covered by heavier work` : ''}.`
      : 'No finding calls for a repair.',
  };
}
