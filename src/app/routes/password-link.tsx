import { useParams } from "react-router";
import { PasswordLinkPage } from "../../features/auth/components/password-link-page.tsx";
import { ForgotPasswordPage } from "../../features/auth/components/forgot-password-page.tsx";

/** /welcome/:token and /reset-password/:token: the server says which the link is for. */
export function PasswordLinkRoute() {
  const { token = "" } = useParams();
  return <PasswordLinkPage key={token} token={token} />;
}

export function ForgotPasswordRoute() {
  return <ForgotPasswordPage />;
}
