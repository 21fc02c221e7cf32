import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { ApiError } from '../api/client';
import { meQuery } from '../api/session';
import { useVerify, useVerifyPackage } from '../api/verify';
import { Button } from '../components/button';
import { FormError, TextField } from '../components/field';
import { ScreeningCaution } from '../components/screening-caution';
import { messageFor } from '../components/server-errors';
import { ThemeSwitch } from '../components/theme-switch';
import { PackageVerifyAnswer } from '../features/verify/package-verify-result';
import { isPackageCode, readVerifyCode } from '../features/verify/verify-code';
import { VerifyAnswer } from '../features/verify/verify-result';

function VerifyForm({ initial, serverError }: { initial: string; serverError: string | null }) {
  const navigate = useNavigate();
  const [typed, setTyped] = useState(initial);
  const [error, setError] = useState<string | null>(null);
  const shown = error ?? serverError;
  return (
    <form
      noValidate
      aria-label="Verify a code"
      className="flex flex-wrap items-start gap-2"
      onSubmit={(event) => {
        event.preventDefault();
        const read = readVerifyCode(typed);
        if (!read.ok) {
          setError(read.reason);
          return;
        }
        setError(null);
        navigate(`/verify/${read.code}`);
      }}
    >
      <TextField
        label="Verify code or content hash"
        hint="The 12-digit code printed on the sheet beside its QR code (such as abcd-ef01-2345), the full 64-digit content hash, or an issue package's code (PKG-3f9a-0c11-7be2)."
        error={shown ?? undefined}
        value={typed}
        onChange={(event) => {
          setTyped(event.target.value);
          setError(null);
        }}
        autoComplete="off"
        spellCheck={false}
        className="min-w-0 flex-1 basis-72"
      />
      <Button type="submit" variant="primary" className="mt-5">
        Verify
      </Button>
    </form>
  );
}

/**
 * The public verify page (no sign-in): what a sheet's QR code opens. It tells
 * whether a code matches a countersigned revision, and nothing else.
 */
export function VerifyRoute() {
  const { code = '' } = useParams();
  const client = useQueryClient();
  const signedIn = Boolean(client.getQueryData(meQuery.queryKey));
  const forPackage = isPackageCode(code);
  const sheetAnswer = useVerify(forPackage ? '' : code);
  const packageAnswer = useVerifyPackage(forPackage ? code : '');
  const verify = forPackage ? packageAnswer : sheetAnswer;
  const malformed =
    verify.error instanceof ApiError && verify.error.status === 400
      ? (verify.error.fields[0]?.message ?? verify.error.message)
      : null;
  return (
    <div className="flex min-h-screen flex-col">
      <header className="border-b border-line bg-panel">
        <div className="mx-auto flex max-w-3xl items-center justify-between gap-3 px-4 py-2">
          <p className="flex items-center gap-2 font-semibold tracking-tight">
            <img src="/favicon.svg" alt="" className="h-5 w-5" />
            Hoopline
          </p>
          <div className="flex items-center gap-3">
            <ThemeSwitch />
            {signedIn ? (
              <Link to="/projects" className="text-sm text-accent hover:underline">
                Back to Projects
              </Link>
            ) : (
              <Link to="/sign-in" className="text-sm text-accent hover:underline">
                Sign in
              </Link>
            )}
          </div>
        </div>
      </header>
      <main id="main" className="mx-auto flex w-full max-w-3xl flex-col gap-4 px-4 py-6">
        <div>
          <h1 className="text-xl font-semibold tracking-tight">Verify a sheet</h1>
          <p className="mt-1 text-sm text-muted">
            Every stamped-for-review Hoopline sheet carries a verify code and a QR code, and every
            issue package a package code. Type the code, or scan the QR code, to learn whether the
            sheet matches a countersigned revision, or the package the current set of them. This
            page shows nothing else of the project.
          </p>
        </div>
        <VerifyForm key={code} initial={code} serverError={malformed} />
        {code && !malformed ? (
          verify.isPending ? (
            <p role="status" className="text-sm text-muted">
              Looking up {code}…
            </p>
          ) : verify.isError ? (
            <FormError message={`The code could not be checked: ${messageFor(verify.error)}`} />
          ) : forPackage ? (
            packageAnswer.data ? (
              <PackageVerifyAnswer result={packageAnswer.data} code={code} />
            ) : null
          ) : sheetAnswer.data ? (
            <VerifyAnswer result={sheetAnswer.data} code={code} />
          ) : null
        ) : null}
        <ScreeningCaution />
        <p className="text-xs text-muted">
          A match means the sheet&apos;s content hash is that of a revision a second engineer
          countersigned in this installation of Hoopline. It does not approve a design: fabrication
          and testing follow the applicable pressure-equipment code and local regulations, under a
          qualified engineer.
        </p>
      </main>
    </div>
  );
}
