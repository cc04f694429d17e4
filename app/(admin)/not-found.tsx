import { NotFoundPanel } from "@/components/shell/not-found-panel";

export default function GroupNotFound() {
  return <NotFoundPanel />;
}
