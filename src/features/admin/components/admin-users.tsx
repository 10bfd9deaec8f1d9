import { useCallback, useState } from "react";
import { Notice } from "@/components/ui/notice";
import { Spinner } from "@/components/ui/spinner";
import { RoleBadge } from "@/components/ui/role-badge";
import { roles, roleSummaries, type PublicUser, type Role } from "@/shared/auth";
import { useUsers } from "../api/get-users";
import { useSetRole } from "../api/set-role";
import { UsersTable } from "./users-table";

type Outcome = { tone: "holds" | "fault"; text: string } | null;

/** The admin's accounts screen: the table, what each role may do, and the outcome of the last change. */
export function AdminUsers({ currentUserId }: { currentUserId: number | undefined }) {
  const users = useUsers();
  const setRole = useSetRole();
  const [outcome, setOutcome] = useState<Outcome>(null);
  const [pendingUserId, setPendingUserId] = useState<number | null>(null);

  const onRoleChange = useCallback(
    (user: PublicUser, role: Role) => {
      if (role === user.role) return;
      setPendingUserId(user.id);
      setOutcome(null);
      setRole.mutate(
        { userId: user.id, role },
        {
          onSuccess: (updated) =>
            setOutcome({ tone: "holds", text: `${updated.displayName} is now ${updated.role}.` }),
          onError: (error) =>
            setOutcome({
              tone: "fault",
              text: `${user.displayName} keeps the ${user.role} role: ${error.message}`,
            }),
          onSettled: () => setPendingUserId(null),
        },
      );
    },
    [setRole],
  );

  return (
    <div className="grid gap-8 lg:grid-cols-[1fr_18rem]">
      <section aria-labelledby="accounts-heading" className="min-w-0 space-y-4">
        <h2 id="accounts-heading" className="text-xl">
          Accounts
        </h2>
        <div aria-live="polite">{outcome ? <Notice tone={outcome.tone}>{outcome.text}</Notice> : null}</div>
        {users.isPending ? <Spinner label="Loading accounts" /> : null}
        {users.isError ? (
          <Notice tone="fault" title="The accounts could not be loaded">
            {users.error.message}
          </Notice>
        ) : null}
        {users.data ? (
          <UsersTable
            users={users.data}
            currentUserId={currentUserId}
            pendingUserId={pendingUserId}
            onRoleChange={onRoleChange}
          />
        ) : null}
      </section>
      <aside aria-labelledby="roles-heading" className="space-y-3">
        <h2 id="roles-heading" className="text-xl">
          What each role may do
        </h2>
        <dl className="space-y-3 rounded-lg border border-steel-200 bg-white p-4">
          {roles.map((role) => (
            <div key={role}>
              <dt>
                <RoleBadge role={role} />
              </dt>
              <dd className="mt-1 text-sm text-steel-700">{roleSummaries[role]}</dd>
            </div>
          ))}
        </dl>
        <p className="text-sm text-steel-600">
          Guests (not signed in) can browse, configure and use the calculators without an account.
        </p>
      </aside>
    </div>
  );
}
