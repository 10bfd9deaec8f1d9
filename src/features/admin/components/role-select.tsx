import { roles, type Role } from "@/shared/auth";

/** A role picker for one user's row; the label names the user and e-mail so each select is distinct to a screen reader. */
export function RoleSelect({
  userName,
  userEmail,
  value,
  disabled,
  onChange,
}: {
  userName: string;
  userEmail: string;
  value: Role;
  disabled?: boolean;
  onChange: (role: Role) => void;
}) {
  return (
    <select
      aria-label={`Role of ${userName} (${userEmail})`}
      value={value}
      disabled={disabled}
      onChange={(e) => onChange(e.target.value as Role)}
      className="min-h-11 rounded-md border border-steel-300 bg-white px-2 font-semibold text-steel-900 hover:border-steel-400 disabled:opacity-60"
    >
      {roles.map((role) => (
        <option key={role} value={role}>
          {role}
        </option>
      ))}
    </select>
  );
}
