import { memberRoute } from "@/lib/http/handler";
import { settingsPatch, updateSettings } from "@/lib/settings";

/** Every member may change their own display settings (own-seats:read is held by every role). */
export const PATCH = memberRoute("own-seats:read", { body: settingsPatch }, ({ member, body }) => updateSettings(member, body));
