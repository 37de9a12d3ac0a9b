// Why the camera did not start, in words a yard hand can act on. Browsers report
// getUserMedia failures by DOMException name; html5-qrcode wraps some of them in a string.

export type CameraProblem = "denied" | "none" | "busy" | "insecure" | "unsupported" | "other";

export const CAMERA_MESSAGES: Record<CameraProblem, string> = {
  denied:
    "The camera is blocked for Linkyard. Allow the camera for this site in the browser's settings, then tap Start camera. Or type the code below.",
  none: "No camera was found on this device. Type the code printed under the QR code below.",
  busy: "Another app is using the camera. Close it, then tap Start camera. Or type the code below.",
  insecure: "The camera only works when Linkyard is opened over https. Type the code below.",
  unsupported: "This browser cannot use the camera for scanning. Type the code below.",
  other: "The camera did not start. Tap Start camera to try again, or type the code below.",
};

/**
 * Sorts a camera start failure into a problem with a message.
 * @example cameraProblem(new DOMException("Permission denied", "NotAllowedError")) // "denied"
 * @example cameraProblem("Error getting userMedia, error = NotFoundError: Requested device not found") // "none"
 */
export function cameraProblem(error: unknown): CameraProblem {
  const name = typeof error === "object" && error && "name" in error ? String((error as { name: unknown }).name) : "";
  const text = `${name} ${typeof error === "string" ? error : error instanceof Error ? error.message : ""}`;
  if (/NotAllowedError|PermissionDenied|SecurityError|Permission denied|permission dismissed/i.test(text)) return "denied";
  if (/NotFoundError|DevicesNotFound|OverconstrainedError|Requested device not found|no camera/i.test(text)) return "none";
  if (/NotReadableError|TrackStartError|AbortError|Could not start video source/i.test(text)) return "busy";
  if (/streaming not supported|getUserMedia is not|mediaDevices/i.test(text)) return "unsupported";
  return "other";
}
