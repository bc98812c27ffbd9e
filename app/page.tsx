import { redirect } from "next/navigation";
import { getCurrentMember } from "@/lib/auth/session";
import { HOME_BY_ROLE } from "@/lib/permissions";

export default async function Home() {
  const member = await getCurrentMember();
  redirect(member ? HOME_BY_ROLE[member.role] : "/sign-in");
}
