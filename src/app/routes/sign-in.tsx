import { useNavigate, useSearchParams } from "react-router";
import { SignInPage } from "../../features/auth/components/sign-in-page.tsx";
import { safeNextPath } from "../../lib/next-path.ts";

export function Component() {
  const navigate = useNavigate();
  const [searchParams] = useSearchParams();
  const next = safeNextPath(searchParams.get("next")) ?? "/";
  return <SignInPage onSignedIn={() => navigate(next, { replace: true })} />;
}
