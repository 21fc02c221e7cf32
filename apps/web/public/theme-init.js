/* global window, document */
// Sets the theme before the first paint (an external file: the server's CSP allows no inline script).
// Same key and values as src/lib/theme.ts.
(function () {
  var choice;
  try {
    choice = window.localStorage.getItem('hoopline.theme');
  } catch {
    choice = null;
  }
  var dark =
    choice === 'dark' ||
    (choice !== 'light' &&
      window.matchMedia &&
      window.matchMedia('(prefers-color-scheme: dark)').matches);
  document.documentElement.setAttribute('data-theme', dark ? 'dark' : 'light');
})();
