import { RefusalText } from "@/components/ui/refusal-text";

export default function Forbidden() {
  return <RefusalText status={403} />;
}
