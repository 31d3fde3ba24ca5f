import { bandRank } from '../grading/bands';
import { money, type Money } from '../money';
import type { CheckResult } from '../result';
import type { RepairAction, RepairCostCatalogue, RepairRule } from './cost-catalogue';

export interface RepairLine {
  actionId: string;
  label: string;
  cost: Money;
  triggeredBy: string[];
}

export interface RepairEstimate {
  catalogueId: string;
  lines: RepairLine[];
  total: Money;
  explanation: string;
}

interface CatalogueIndex {
  rulesByCheck: Map<string, RepairRule[]>;
  actionsById: Map<string, RepairAction>;
}

/** Catalogues are plain data looked up on every scoring; index each one once. */
const INDEXES = new WeakMap<RepairCostCatalogue, CatalogueIndex>();

function indexOf(catalogue: RepairCostCatalogue): CatalogueIndex {
  let index = INDEXES.get(catalogue);
  if (!index) {
    const rulesByCheck = new Map<string, RepairRule[]>();
    for (const rule of catalogue.rules) rulesByCheck.set(rule.checkId, [...(rulesByCheck.get(rule.checkId) ?? []), rule]);
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
  for (const check of checks) {
    if (check.status !== 'measured' || check.band === null) continue;
    const rules = rulesByCheck.get(check.id);
    if (!rules) continue;
    const reachedRank = bandRank(check.band);
    // The most severe band among the rules this check's band reaches; every rule from that band applies.
    let mostSevere = Number.NEGATIVE_INFINITY;
    for (const rule of rules) {
      const from = bandRank(rule.fromBand);
      if (from <= reachedRank && from > mostSevere) mostSevere = from;
    }
    for (const rule of rules) {
      if (bandRank(rule.fromBand) !== mostSevere) continue;
      const by = triggered.get(rule.actionId);
      if (by) by.push(check.id);
      else triggered.set(rule.actionId, [check.id]);
    }
  }
  const superseded = new Set<string>();
  for (const actionId of triggered.keys()) {
    for (const s of actionsById.get(actionId)?.supersedes ?? []) superseded.add(s);
  }
  const lines: RepairLine[] = catalogue.actions
    .filter((a) => triggered.has(a.id) && !superseded.has(a.id))
    .map((a) => ({ actionId: a.id, label: a.label, cost: money(a.costMinor, catalogue.currency), triggeredBy: triggered.get(a.id)! }));
  const total = money(lines.reduce((s, l) => s + l.cost.amountMinor, 0), catalogue.currency);
  const droppedText = [...superseded].filter((id) => triggered.has(id));
  return {
    catalogueId: catalogue.id,
    lines,
    total,
    explanation: lines.length
      ? `${lines.length} repair actions from catalogue "${catalogue.id}"${droppedText.length ? `; ${droppedText.join(', ')} covered by heavier work` : ''}.`
      : 'No finding calls for a repair.',
  };
}
