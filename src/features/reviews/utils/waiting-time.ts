/** How long a submission has waited, in words a reviewer scans: "under 1 h", "3 h", "1 day", "2 days". */
export function waitingTimeInWords(waitingHours: number): string {
  if (!(waitingHours >= 1)) return 'under 1 h';
  if (waitingHours < 24) return `${Math.floor(waitingHours)} h`;
  const days = Math.floor(waitingHours / 24);
  return days === 1 ? '1 day' : `${days} days`;
}
