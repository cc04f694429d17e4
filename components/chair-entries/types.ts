// The shapes the chair's entries island receives from /api/shows/[slug]/entries.
import type { PaymentState } from "@/lib/schemas/chair-entries";

export type ChairEntry = {
  id: string;
  entryNumber: number | null;
  title: string;
  entrantName: string;
  entrantEmail: string;
  widthUm: number;
  lengthUm: number;
  division: string;
  judged: boolean;
  categoryState: string;
  categoryCode: string | null;
  categoryName: string | null;
  status: string;
  paymentState: PaymentState;
  paymentReference: string;
  declaredValueCents: number;
  waitlisted: boolean;
  submittedAt: string | null;
  decisionReleasedAt: string | null;
};

export type ChairEntriesPage = {
  show: { slug: string; name: string; timeZone: string; juried: boolean; currency: string };
  /** The show's categories in its own order, for the filter. */
  categories: { id: string; code: string; name: string }[];
  total: number;
  limit: number;
  offset: number;
  entries: ChairEntry[];
};
