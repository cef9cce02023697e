/* global localStorage, window, document */
// Sets the theme class before the first paint, so a dark system never flashes light.
(function () {
  var saved = null;
  try {
    saved = localStorage.getItem('fourfold.theme');
  } catch {
    saved = null;
  }
  var dark =
    saved === 'dark' ||
    ((saved === null || saved === 'system') && window.matchMedia('(prefers-color-scheme: dark)').matches);
  document.documentElement.classList.toggle('dark', dark);
})();
