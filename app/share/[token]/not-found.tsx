import { ShareGone } from "@/components/share/share-gone";

// Expired, revoked or never issued: one plain answer that tells nothing about which.
export default function SharedRevisionGone() {
  return <ShareGone />;
}
