import { queryOptions } from "@tanstack/react-query";
import type { MemberRow, PendingInvitation } from "@/lib/members";
import { api } from "@/lib/client/query";

export interface MembersData {
  members: MemberRow[];
  invitations: PendingInvitation[];
}

/** The organisation's members and pending invitations: one key, invalidated after every change. */
export function membersQuery() {
  return queryOptions({
    queryKey: ["members"],
    queryFn: () => api<MembersData>("/api/members"),
  });
}
