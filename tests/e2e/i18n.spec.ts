import { expect, test } from '@playwright/test';
import { hydrated, signIn } from './helpers';
import { controlTime, newInstall, serverView, tap } from './install-helpers';

// Spanish for the crews: signed out the browser's Accept-Language decides; signed in, the user's own setting
// (the demo's tecnico@demo.test has users.locale = 'es' while this browser asks for English).

test.describe('signed out, the browser’s language decides', () => {
  // The browser's language setting: Chromium sends it as Accept-Language (es-MX,es;q=0.9).
  test.use({ locale: 'es-MX' });

  test('/sign-in with Accept-Language: es is in Spanish, failures included', async ({ page }) => {
    await page.goto('/sign-in');
    await expect(page.locator('html')).toHaveAttribute('lang', 'es');
    await expect(page).toHaveTitle(/Iniciar sesión/);
    await expect(page.getByText('Inicie sesión para ver los trabajos de su empresa')).toBeVisible();
    // The form's own checks, before anything is sent.
    await hydrated(page);
    await page.getByRole('button', { name: 'Iniciar sesión' }).click();
    await expect(page.locator('#email-error')).toHaveText('Escriba el correo electrónico con el que inicia sesión');
    await expect(page.locator('#password-error')).toHaveText('Escriba su contraseña');
    await page.getByLabel('Correo electrónico').fill('nadie@demo.test');
    await page.getByLabel('Contraseña').fill('no-es-la-clave');
    await page.getByRole('button', { name: 'Iniciar sesión' }).click();
    await expect(page.getByRole('main').getByRole('alert')).toHaveText(
      'Ese correo y esa contraseña no corresponden a una cuenta activa.',
    );
  });
});

test('/sign-in answers in English to an English browser and to one that names no language we speak', async ({
  request,
}) => {
  for (const language of ['en-US,en;q=0.9', 'de-DE', '']) {
    const html = await (await request.get('/sign-in', { headers: { 'Accept-Language': language } })).text();
    expect(html, language).toContain('<html lang="en"');
    expect(html, language).toContain('Sign in to your company');
  }
  const spanish = await (await request.get('/sign-in', { headers: { 'Accept-Language': 'es' } })).text();
  expect(spanish).toContain('<html lang="es"');
  expect(spanish).toContain('Inicie sesión para ver los trabajos de su empresa');
});

test.describe('a Spanish-speaking technician', () => {
  test.use({ serviceWorkers: 'block' });

  test('runs a whole install in Spanish, the clock and the record in Spanish words and numbers', async ({ page }) => {
    test.setTimeout(120_000);
    const time = await controlTime(page);
    await signIn(page, 'tecnico@demo.test');
    await expect(page).toHaveURL('/today');
    await expect(page.locator('html')).toHaveAttribute('lang', 'es');
    await expect(page.getByRole('heading', { level: 1 })).toHaveText('El trabajo de hoy');
    await expect(page.getByTestId('user-name')).toHaveText('Inés Barragán Soto · Técnico');
    await expect(page.getByRole('button', { name: 'Cerrar sesión' })).toBeVisible();

    const id = await newInstall(page, '-0003', 0);
    await page.goto(`/installs/${id}`);
    const safety = page.getByTestId('step-safety');
    await expect(safety.getByRole('heading')).toHaveText('Antes de empezar');
    await expect(safety).toContainText('Espacio confinado');
    await expect(safety).toContainText('Empacador a presión');
    await expect(safety).toContainText('no sustituyen sus normas locales');
    await tap(page, 'Entendido — empezar');

    await expect(page.getByTestId('step-checks')).toContainText('Revisiones antes de instalar');
    for (const box of await page.getByRole('checkbox').all()) await box.check();
    await tap(page, 'Revisiones hechas');

    await expect(page.getByTestId('step-dry-run')).toContainText('Prueba en seco');
    await tap(page, 'Empezar prueba en seco');
    await time.advance(3);
    await tap(page, 'Empacador de vuelta — parar');

    const conditions = page.getByTestId('step-conditions');
    await expect(conditions).toContainText('Condiciones y materiales');
    const kit = page.locator('#resinKitId option', { hasText: 'SAE-2610-014' });
    await expect(kit).toContainText('usar antes del');
    const fillConditions = async (mixF: string, pipeF: string) => {
      await page.getByLabel(/Resina en el cubo/).fill(mixF);
      await page.getByLabel(/Aire en el lugar de mezcla/).fill('68');
      await page.getByLabel(/Tubería \/ flujo/).fill(pipeF);
      await page.locator('#resinKitId').selectOption((await kit.getAttribute('value'))!);
      await tap(page, 'Guardar condiciones');
    };
    // The event's SI limit (60 °C) said in Spanish and in the company's units.
    await fillConditions('200', '57');
    await expect(conditions).toContainText('Fuera de rango: por encima de 140 °F');
    // A pipe colder than the resin's rating: NO-GO, its reasons in Spanish with the Spanish temperatures.
    await fillConditions('68', '20');
    await expect(page.getByTestId('go-verdict')).toHaveText('NO SEGUIR');
    const go = page.getByTestId('step-go');
    await expect(go).toContainText(/La tubería a 20 °F está más fría que el mínimo de esta resina, \d+ °F/);
    await expect(go).toContainText('Fuera del rango de la resina sus tiempos publicados no valen');
    await expect(page.getByTestId('plan-counted')).toContainText(/^Contado: [\d,]+ min desde la mezcla/);
    await expect(go).not.toContainText(/colder than|Counted:/);
    await page.getByRole('button', { name: 'Cambiar condiciones o materiales' }).click();
    await fillConditions('68', '57');

    await expect(page.getByTestId('go-verdict')).toHaveText('SEGUIR');
    await tap(page, 'Listo para mezclar');
    await tap(page, 'Resina mezclada');
    await expect(page.getByTestId('countdown').first()).toHaveAttribute(
      'aria-label',
      'Inflar antes de (con la reserva)',
    );
    await time.advance(5);
    await tap(page, 'Parche cargado');
    await time.advance(5);
    await tap(page, 'Empacador en posición');
    await time.advance(4);

    const inflate = page.getByTestId('step-inflate');
    await expect(inflate.getByRole('heading')).toHaveText('Infle la vejiga');
    // The packer's rating in psi with the Spanish decimal comma (the demo company works in imperial units).
    await expect(inflate).toContainText(/Rango del empacador \d+,\d–\d+,\d psi/);
    await page.getByLabel(/Presión del manómetro \(psi\)/).fill('15');
    await tap(page, 'Vejiga inflada');

    await expect(page.getByTestId('step-hold')).toContainText('Manteniendo');
    await expect(page.getByTestId('hold-note')).toContainText('mantener inflado');
    await expect(page.getByTestId('countdown').first()).toHaveAttribute(
      'aria-label',
      'Desinflar después de (fraguado + 10 %)',
    );
    // A reading under the packer's rating, recorded on purpose: its flag says why in Spanish.
    await page.getByLabel(/Presión del manómetro \(psi\)/).fill('1');
    await tap(page, 'Añadir lectura de presión');
    await tap(page, 'Sí, registrar esta presión');
    await expect(page.locator('[data-kind="pressure-out-of-range"]')).toHaveText(
      /^1 de 2 lecturas de presión fuera del rango del empacador, \d+,\d psi–\d+,\d psi \(lecturas de 1,0 psi a 15,0 psi\)\.$/,
    );
    await time.advance(160);
    await tap(page, 'Vejiga desinflada');

    await expect(page.getByTestId('step-inspect')).toContainText('Inspeccione el parche');
    const evidence = page.getByTestId('evidence');
    await expect(evidence.getByRole('heading')).toHaveText('Imágenes de la inspección');
    await expect(evidence).toContainText('Aún no hay imágenes ni vídeos.');
    await expect(evidence.getByLabel('Tipo')).toHaveValue('inspection');
    await expect(evidence.getByText('Hacer una foto o un vídeo', { exact: true })).toBeVisible();
    await page.getByRole('radio', { name: 'Bien' }).click();
    await tap(page, 'Registrar inspección');
    await expect(page.getByTestId('step-sign-off')).toContainText('El capataz firma la instalación');
    await expect(page.getByTestId('sync-status')).toHaveText('Todos los toques sincronizados', { timeout: 20_000 });
    // Nothing refused on the way: a refused tap leaves the queue too, into the "needs attention" list.
    await expect(page.getByTestId('outbox-parked')).toHaveCount(0);
    await expect(page.getByTestId('event-log')).toContainText('Vejiga inflada');
    await expect(page.getByTestId('event-log')).toContainText('sincronizado');
    await expect(page.locator('main')).not.toContainText(
      /Bladder|Resin mixed|Packer in position|All taps synced|pressure readings|No images or videos|Caption/,
    );

    const view = await serverView(page, id);
    expect(view.flags.map((f: { kind: string }) => f.kind)).toEqual(['pressure-out-of-range']);
    expect(view.state.step).toBe('sign_off');
    expect(view.events.map((e: { type: string }) => e.type)).toEqual([
      'safety_acknowledged',
      'checks_done',
      'dry_run_started',
      'dry_run_finished',
      'conditions_recorded',
      'conditions_recorded',
      'go_decision',
      'resin_mixed',
      'patch_loaded',
      'packer_in_position',
      'bladder_inflated',
      'pressure_reading',
      'bladder_deflated',
      'inspection_recorded',
    ]);
  });

  test('the language is the user’s own setting, changed on the profile page', async ({ page }) => {
    await signIn(page, 'tecnico@demo.test');
    await expect(page).toHaveURL('/today');
    await page.goto('/profile');
    await expect(page.getByRole('heading', { level: 1 })).toHaveText('Perfil');
    await expect(page.getByRole('radio', { name: 'Español', exact: true })).toBeChecked();
    await page.getByRole('radio', { name: 'English', exact: true }).check();
    await page.getByRole('button', { name: 'Guardar' }).click();
    await expect(page.getByRole('heading', { level: 1 })).toHaveText('Profile');
    await page.goto('/today');
    await expect(page.getByRole('heading', { level: 1 })).toHaveText("Today's work");
    // Back to Spanish, as the demo has it.
    const restored = await page.request.patch('/api/profile', { data: { locale: 'es' } });
    expect(restored.status()).toBe(200);
    await page.goto('/today');
    await expect(page.getByRole('heading', { level: 1 })).toHaveText('El trabajo de hoy');
  });

  test('a page that is not there says so in Spanish', async ({ page }) => {
    await signIn(page, 'tecnico@demo.test');
    await expect(page).toHaveURL('/today');
    const response = await page.goto('/installs/00000000-0000-4000-8000-000000000000');
    expect(response?.status()).toBe(404);
    await expect(page.getByRole('heading', { level: 1 })).toHaveText('No encontrado');
    await expect(page.getByRole('link', { name: 'Ir a su página de inicio' })).toBeVisible();
  });
});

test('an office user who reads Spanish gets the desk’s navigation and common actions in Spanish', async ({ page }) => {
  await signIn(page, 'office@demo.test');
  await expect(page).toHaveURL('/jobs');
  expect((await page.request.patch('/api/profile', { data: { locale: 'es' } })).status()).toBe(200);
  try {
    await page.goto('/jobs');
    await expect(page.locator('html')).toHaveAttribute('lang', 'es');
    await expect(page.getByRole('navigation').getByRole('link', { name: 'Trabajos' })).toBeVisible();
    const search = page.getByRole('search');
    await expect(search.getByText('Buscar', { exact: true })).toBeVisible();
    await expect(search.getByRole('button', { name: 'Filtrar' })).toBeVisible();
    await expect(page.getByRole('link', { name: 'Exportar CSV' })).toBeVisible();
    await expect(page.getByText(/^\d+ en total · página 1 de \d+$/)).toBeVisible();
    await expect(page.getByRole('button', { name: 'Siguiente' })).toBeVisible();
  } finally {
    // The demo's office user follows the browser's language.
    expect((await page.request.patch('/api/profile', { data: { locale: null } })).status()).toBe(200);
  }
});
