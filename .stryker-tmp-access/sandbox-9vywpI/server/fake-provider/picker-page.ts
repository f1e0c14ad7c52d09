// @ts-nocheck
import type { FakePerson } from './people-store';

const escapeHtml = (text: string) => text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

function hiddenFields(params: Record<string, string>): string {
  return Object.entries(params)
    .map(([k, v]) => `<input type="hidden" name="${escapeHtml(k)}" value="${escapeHtml(v)}">`)
    .join('');
}

/** The fake provider's sign-in page: pick an invented person, or type a new name and e-mail. */
export function pickerPage(params: Record<string, string>, people: { demo: FakePerson[]; typed: FakePerson[] }, problem?: string): string {
  const hidden = hiddenFields(params);
  const personButton = (p: FakePerson) => `
    <form method="post" action="/authorize">${hidden}<input type="hidden" name="subject" value="${escapeHtml(p.subject)}">
      <button type="submit" class="person">
        <span class="name">${escapeHtml(p.name)}</span>
        <span class="email">${escapeHtml(p.email)}</span>
        ${p.note ? `<span class="note">${escapeHtml(p.note)}</span>` : ''}
      </button>
    </form>`;
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>Local sign-in — Tramontane</title>
<style>
  body { margin: 0; font: 15px/1.45 system-ui, sans-serif; background: #f6f5f1; color: #1d2327; }
  header { background: #1f3a4a; color: #f6f5f1; padding: 14px 24px; }
  header p { margin: 2px 0 0; color: #e5edf0; font-size: 13px; }
  main { max-width: 560px; margin: 28px auto; padding: 0 16px; }
  section { background: #fff; border: 1px solid #dcdad2; border-radius: 6px; padding: 16px; margin-bottom: 18px; }
  h1 { font-size: 18px; margin: 0; } h2 { font-size: 14px; margin: 0 0 10px; }
  .person { display: grid; width: 100%; text-align: left; background: #fff; border: 1px solid #dcdad2; border-radius: 6px;
            padding: 10px 12px; margin-bottom: 8px; cursor: pointer; font: inherit; color: inherit; }
  .person:hover, .person:focus-visible { border-color: #2e5468; background: #e5edf0; }
  .name { font-weight: 600; } .email { font-size: 13px; color: #4a545b; } .note { font-size: 12px; color: #6b747a; }
  label { display: block; font-size: 13px; margin-bottom: 10px; }
  input[type=text], input[type=email] { display: block; width: 100%; box-sizing: border-box; margin-top: 4px; padding: 7px 9px;
            border: 1px solid #dcdad2; border-radius: 4px; font: inherit; }
  .go { background: #1f3a4a; color: #f6f5f1; border: 0; border-radius: 4px; padding: 8px 14px; font: inherit; cursor: pointer; }
  .problem { border-color: #9b2f25; background: #fbeceb; }
  .small { font-size: 12px; color: #4a545b; }
</style></head>
<body>
<header><h1>Local sign-in</h1><p>A stand-in identity provider for trying Tramontane on this machine. No passwords: pick who you are.</p></header>
<main>
  ${problem ? `<section class="problem" role="alert">${escapeHtml(problem)}</section>` : ''}
  <section aria-labelledby="demo-people"><h2 id="demo-people">Invented demo people</h2>${people.demo.map(personButton).join('')}</section>
  ${people.typed.length ? `<section aria-labelledby="typed-people"><h2 id="typed-people">People typed in before</h2>${people.typed.map(personButton).join('')}</section>` : ''}
  <section aria-labelledby="someone-new"><h2 id="someone-new">Someone new</h2>
    <form method="post" action="/authorize">${hidden}
      <label>Name <input type="text" name="name" required maxlength="120" autocomplete="off"></label>
      <label>E-mail <input type="email" name="email" required maxlength="200" autocomplete="off"></label>
      <button type="submit" class="go">Sign in as this person</button>
    </form>
  </section>
  <p class="small">Point Tramontane at a real OpenID Connect provider with the OIDC_* settings described in the README.</p>
</main></body></html>`;
}
