import { ROLES, ROLE_DESCRIPTIONS, ROLE_LABELS, type Role } from "@/permissions/roles";

export function RoleCheckboxes({ selected, errors }: { selected: Role[]; errors?: string[] }) {
  return (
    <fieldset className="mb-4">
      <legend className="field-label">Roles</legend>
      <div className="grid gap-2 sm:grid-cols-2">
        {ROLES.map((role) => (
          <label key={role} className="flex items-start gap-2 rounded border border-sand-300 bg-sand-50 p-2">
            <input type="checkbox" name="roles[]" value={role} defaultChecked={selected.includes(role)} className="mt-1 size-4" />
            <span><span className="font-bold">{ROLE_LABELS[role]}</span><span className="block text-xs text-ink-500">{ROLE_DESCRIPTIONS[role]}</span></span>
          </label>
        ))}
      </div>
      {errors?.length ? <p className="field-error">{errors.join(" ")}</p> : null}
    </fieldset>
  );
}
