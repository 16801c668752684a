import { Alert } from '../ui/alert';

/** Shown in place of a page the user's roles in the active lab do not open. */
export function NotPermitted({ title, neededRole }: { title: string; neededRole: string }) {
  return (
    <>
      <h1 className="mb-6 text-3xl font-bold">{title}</h1>
      <Alert tone="info" title="Not permitted">
        This page is for members with the {neededRole} role in the active lab. Ask your lab administrator if you need
        it.
      </Alert>
    </>
  );
}
