import { RefusalText } from "@/components/ui/refusal-text";

export default function NotFound() {
  return <RefusalText status={404} />;
}
