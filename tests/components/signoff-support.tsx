// The sign-off panel as a version's page mounts it (other versions linked to their review pages),
// for the sign-off component tests.
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render } from "@testing-library/react";
import { SignOffPanel, type SignOffData } from "@/components/review/SignOff";

export function showSignOff(data: SignOffData, concerns?: string[], version = 3) {
  return render(
    <QueryClientProvider client={new QueryClient()}>
      <SignOffPanel data={data} path={`/api/sketches/s1/versions/${version}/signoff`} number={version} concerns={concerns} versionHref={(n) => `/workspaces/w1/sketches/s1/versions/${n}`} onChanged={() => {}} />
    </QueryClientProvider>,
  );
}
