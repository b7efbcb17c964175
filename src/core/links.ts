/**
 * Where fitgate's documentation lives on the web: the published repository, and the page of
 * each check (docs/checks.md, one `### <id>` heading per check, which GitHub anchors as `#<id>`).
 * The version's tag pins the page to the text of the release that wrote the link.
 */
import { VERSION } from './version.js';

/** The repository fitgate is published from (package.json `repository` says the same; a test keeps them in step). */
export const REPOSITORY_URL = 'https://github.com/fitgate/fitgate';

/** The documentation page of a check: `<repository>/blob/v<version>/docs/checks.md#<id>`. */
export function checkDocsUrl(id: string): string {
  return `${REPOSITORY_URL}/blob/v${VERSION}/docs/checks.md#${encodeURIComponent(id)}`;
}
