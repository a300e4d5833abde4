"use client";
import { useState } from "react";
import { api, describeFailure } from "../templates/api";

type Role = "admin" | "coach" | "athlete";
export type AccountRow = { id: string; name: string; email: string; role: Role; createdAt: string; disabled: boolean };

const JOINED = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });

/**
 * Every account with its role and state. An admin changes a role or disables
 * an account in place; disabling asks once more, since it signs the person out
 * everywhere. Their own row is read-only.
 */
export function AccountsTable({ initial, selfId }: { initial: AccountRow[]; selfId: string }) {
  const [rows, setRows] = useState(initial);
  const [busy, setBusy] = useState<string | null>(null);
  const [confirming, setConfirming] = useState<string | null>(null);
  const [problem, setProblem] = useState<{ id: string; text: string } | null>(null);

  async function change(row: AccountRow, body: { disabled?: boolean; role?: Role }) {
    setBusy(row.id);
    setProblem(null);
    try {
      const { account } = await api<{ account: AccountRow }>(`/api/admin/accounts/${row.id}`, { method: "PATCH", json: body });
      setRows((all) => all.map((r) => (r.id === account.id ? account : r)));
    } catch (e) {
      setProblem({ id: row.id, text: describeFailure(e) });
    } finally {
      setBusy(null);
      setConfirming(null);
    }
  }

  return (
    <div className="panel overflow-x-auto">
      <table className="w-full text-left text-sm">
        <thead className="border-b border-chalk-200 text-xs uppercase tracking-wider text-iron-400">
          <tr>
            <th className="px-3 py-3 sm:px-4 font-semibold">Name</th>
            <th className="hidden px-3 py-3 sm:px-4 font-semibold sm:table-cell">E-mail</th>
            <th className="px-3 py-3 sm:px-4 font-semibold">Role</th>
            <th className="hidden px-3 py-3 sm:px-4 font-semibold md:table-cell">Joined</th>
            <th className="px-3 py-3 sm:px-4 font-semibold">State</th>
          </tr>
        </thead>
        <tbody className="divide-y divide-chalk-200">
          {rows.map((u) => {
            const self = u.id === selfId;
            return (
              <tr key={u.id} data-testid="account-row" data-state={u.disabled ? "disabled" : "active"} className={u.disabled ? "bg-chalk-50 text-iron-400" : ""}>
                <td className="px-3 py-3 sm:px-4 font-medium">
                  {u.name}
                  {self ? <span className="ml-1.5 text-xs font-normal text-iron-400">(you)</span> : null}
                  <span className="block max-w-[10rem] truncate text-xs font-normal text-iron-500 sm:hidden" title={u.email}>{u.email}</span>
                  {problem?.id === u.id ? <p role="alert" className="mt-1 max-w-xs text-xs font-normal text-ember-700">{problem.text}</p> : null}
                </td>
                <td className="hidden px-3 py-3 sm:px-4 text-iron-500 sm:table-cell">{u.email}</td>
                <td className="px-3 py-3 sm:px-4">
                  <select
                    aria-label={`Role of ${u.name}`}
                    value={u.role}
                    disabled={self || busy === u.id}
                    onChange={(e) => void change(u, { role: e.target.value as Role })}
                    className="rounded border border-iron-200 bg-white px-1.5 py-1 text-sm capitalize text-iron disabled:bg-chalk-100 disabled:text-iron-400"
                  >
                    <option value="coach">coach</option>
                    <option value="athlete">athlete</option>
                    <option value="admin">admin</option>
                  </select>
                </td>
                <td className="hidden px-3 py-3 sm:px-4 text-iron-500 md:table-cell">{JOINED.format(new Date(u.createdAt))}</td>
                <td className="px-3 py-3 sm:px-4">
                  {self ? (
                    <span className="text-xs text-iron-400">active</span>
                  ) : confirming === u.id ? (
                    <span className="flex flex-wrap items-center gap-2">
                      <span className="text-xs text-iron-600">Sign {u.name.split(" ")[0]} out everywhere and block sign-in?</span>
                      <button type="button" className="rounded bg-ember-600 px-2 py-1 text-xs font-semibold text-white" disabled={busy === u.id} onClick={() => void change(u, { disabled: true })}>
                        Disable
                      </button>
                      <button type="button" className="text-xs text-iron-500 underline" onClick={() => setConfirming(null)}>Cancel</button>
                    </span>
                  ) : u.disabled ? (
                    <span className="flex items-center gap-2">
                      <span className="rounded bg-chalk-200 px-2 py-0.5 text-xs font-semibold text-iron-600">disabled</span>
                      <button type="button" className="text-xs font-semibold text-ember-700 underline" disabled={busy === u.id} onClick={() => void change(u, { disabled: false })} aria-label={`Enable ${u.name}`}>
                        Enable
                      </button>
                    </span>
                  ) : (
                    <span className="flex items-center gap-2">
                      <span className="text-xs text-moss-700">active</span>
                      <button type="button" className="text-xs font-semibold text-iron-500 underline hover:text-ember-700" onClick={() => setConfirming(u.id)} aria-label={`Disable ${u.name}`}>
                        Disable
                      </button>
                    </span>
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
