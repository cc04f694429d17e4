// Every show on the platform, for the administrator: stage, dates, chairs and entry count.
import Link from "next/link";
import { formatDateRange, type DateInput } from "@/components/format/dates";
import { ShowStatusBadge } from "@/components/shows/show-status";
import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";

type AdminShow = {
  id: string;
  slug: string;
  name: string;
  guildName: string;
  status: string;
  timeZone: string;
  showOpensAt: DateInput;
  showClosesAt: DateInput;
  chairs: { name: string; email: string }[];
  invitedChairs: string[];
  entryCount: number;
};

export function ShowsTable({ shows }: { shows: AdminShow[] }) {
  return (
    <Table caption="All shows">
      <THead>
        <tr>
          <Th>Show</Th>
          <Th>Stage</Th>
          <Th>Show days</Th>
          <Th>Chair</Th>
          <Th className="text-right">Entries</Th>
        </tr>
      </THead>
      <TBody>
        {shows.map((s) => (
          <Tr key={s.id}>
            <Td label="Show" primary>
              {s.status === "draft" ? s.name : <Link href={`/shows/${s.slug}`}>{s.name}</Link>}
              <span className="block text-sm font-normal text-ink-muted">
                {s.guildName} · /shows/{s.slug}
              </span>
            </Td>
            <Td label="Stage">
              <ShowStatusBadge status={s.status} />
            </Td>
            <Td label="Show days">{formatDateRange(s.showOpensAt, s.showClosesAt, s.timeZone) ?? <span className="text-ink-muted">Not set</span>}</Td>
            <Td label="Chair">
              <ul className="space-y-1">
                {s.chairs.map((c) => (
                  <li key={c.email}>
                    {c.name} <span className="text-sm break-all text-ink-muted">{c.email}</span>
                  </li>
                ))}
                {s.invitedChairs.map((email) => (
                  <li key={email} className="text-sm text-ink-muted">
                    Invited: <span className="break-all">{email}</span>
                  </li>
                ))}
                {s.chairs.length + s.invitedChairs.length === 0 ? <li className="text-warning-700">No chair yet</li> : null}
              </ul>
            </Td>
            <Td label="Entries" className="sm:text-right">
              <span className="tabular-nums">{s.entryCount}</span>
            </Td>
          </Tr>
        ))}
      </TBody>
    </Table>
  );
}
