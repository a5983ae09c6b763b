import { formatQuantity } from '@/lib/format';
import { REQUIREMENT_FIELD_INFO, isRequirementField } from '@/lib/requirement-fields';

/** A stored requirement value with its unit, e.g. "10 %", "1.2 s", "5" (the dominance ratio). */
export function limitText(field: string, value: number | null | undefined): string {
  const unit = isRequirementField(field) ? REQUIREMENT_FIELD_INFO[field].unit : '';
  return formatQuantity(value ?? null, unit);
}

export function fieldLabel(field: string): string {
  return isRequirementField(field) ? REQUIREMENT_FIELD_INFO[field].label : field;
}
