import { SentMailPage } from "../../features/mail/components/sent-mail-page.tsx";

export function Component() {
  return <SentMailPage />;
}
