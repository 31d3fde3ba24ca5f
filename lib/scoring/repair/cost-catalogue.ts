import type { CheckBand } from '../grading/bands';

/**
 * Repair cost catalogue: plain data the admins will edit later. Each rule says which repair action
 * a check calls for from a given band onward; actions may supersede lighter ones (a bearing
 * replacement makes a preload adjustment redundant). Costs are integer minor units.
 */
export interface RepairAction {
  id: string;
  label: string;
  costMinor: number;
  supersedes?: readonly string[];
}

export interface RepairRule {
  checkId: string;
  fromBand: CheckBand;
  actionId: string;
}

export interface RepairCostCatalogue {
  id: string;
  currency: string;
  description: string;
  actions: readonly RepairAction[];
  rules: readonly RepairRule[];
}
