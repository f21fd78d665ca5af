import { useQuery, useQueryClient } from "@tanstack/react-query";
import { meQueryOptions } from "../../features/auth/api/get-me.ts";
import { PeoplePage } from "../../features/people/components/people-page.tsx";

export function Component() {
  const queryClient = useQueryClient();
  const me = useQuery(meQueryOptions());
  // A change to one's own role or standing ends the session: asking again takes the shell to sign-in.
  const onOwnChange = () => void queryClient.invalidateQueries({ queryKey: meQueryOptions().queryKey });
  return <PeoplePage meId={me.data?.user.id ?? ""} onOwnChange={onOwnChange} />;
}
