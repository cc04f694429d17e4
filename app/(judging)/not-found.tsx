// A show address with no show behind it.
import { NotFoundPanel } from "@/components/shell/not-found-panel";

export default function ShowAreaNotFound() {
  return <NotFoundPanel title="We can’t find that show">There is no show at this address. Check the link, or pick the show from the Shows menu.</NotFoundPanel>;
}
