// The show team (people with a role) and the invitations still waiting for an answer.
import { MailQuestion, Users } from "lucide-react";
import { formatDate, type DateInput } from "@/components/format/dates";
import { Badge } from "@/components/ui/badge";
import { EmptyState } from "@/components/ui/empty-state";
import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { ROLE_LABELS } from "@/lib/schemas/show";
import { RemoveMemberButton } from "./remove-member-button";

type Role = keyof typeof ROLE_LABELS;
type Member = { roleId: string; role: Role; userId: string; name: string; email: string; since: DateInput };
type Invitation = { id: string; email: string; role: Role; expiresAt: DateInput };

export function TeamMembers({ showSlug, timeZone, members, viewerId }: { showSlug: string; timeZone: string; members: Member[]; viewerId: string }) {
  if (members.length === 0) {
    return <EmptyState icon={Users} title="No one on the team yet">Invite judges, scribes and intake volunteers below.</EmptyState>;
  }
  return (
    <Table caption="Show team">
      <THead>
        <tr>
          <Th>Name</Th>
          <Th>Role</Th>
          <Th>E-mail</Th>
          <Th>Since</Th>
          <Th>
            <span className="sr-only">Actions</span>
          </Th>
        </tr>
      </THead>
      <TBody>
        {members.map((m) => (
          <Tr key={m.roleId}>
            <Td label="Name" primary>
              {m.name}
              {m.userId === viewerId ? <span className="ml-2 text-sm font-normal text-ink-muted">(you)</span> : null}
            </Td>
            <Td label="Role">
              <Badge tone={m.role === "chair" ? "gold" : "brand"}>{ROLE_LABELS[m.role]}</Badge>
            </Td>
            <Td label="E-mail">
              <a href={`mailto:${m.email}`} className="break-all">
                {m.email}
              </a>
            </Td>
            <Td label="Since">{formatDate(m.since, timeZone)}</Td>
            <Td label="Actions" className="sm:text-right">
              <RemoveMemberButton showSlug={showSlug} roleId={m.roleId} who={`${m.name} (${ROLE_LABELS[m.role]})`} />
            </Td>
          </Tr>
        ))}
      </TBody>
    </Table>
  );
}

export function PendingInvitations({ timeZone, invitations }: { timeZone: string; invitations: Invitation[] }) {
  if (invitations.length === 0) return <p className="text-ink-muted">No invitations waiting for an answer.</p>;
  return (
    <ul className="divide-y divide-line rounded-card border border-line bg-surface">
      {invitations.map((inv) => (
        <li key={inv.id} className="flex flex-wrap items-center gap-x-4 gap-y-1 px-4 py-3">
          <MailQuestion aria-hidden className="size-5 text-plum-500" />
          <span className="font-medium break-all">{inv.email}</span>
          <Badge tone="neutral">{ROLE_LABELS[inv.role]}</Badge>
          <span className="text-sm text-ink-muted">Link expires {formatDate(inv.expiresAt, timeZone)}</span>
        </li>
      ))}
    </ul>
  );
}
