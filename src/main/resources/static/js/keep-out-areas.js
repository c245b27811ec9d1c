// Design page: stores the last keep-out area of the proposal's keep-out field for the site, and
// removes stored areas, through /api/sites/{id}/keep-out-areas; the page is reloaded after a change
// so the list, the hatched plan and the proposal defaults all show the stored areas.
import { requestJson, siteUrl } from './api.js';
import { parseCornerLines } from './numbers.js';

const box = document.getElementById('keep-out-areas');

if (box) {
  const siteId = box.dataset.siteId;
  const errorLine = document.getElementById('keep-out-error');
  const status = document.getElementById('keep-out-status');
  const url = siteUrl(siteId, '/keep-out-areas');

  function showError(message) {
    errorLine.textContent = message;
    errorLine.hidden = false;
  }

  const call = (method, target, body) => requestJson(method, target, body);

  // The last non-empty line of the keep-out field: "x y; x y; x y", as the plan clicks write it.
  function lastArea() {
    const field = document.getElementById('keep-out');
    if (!field) {
      return [];
    }
    const areas = parseCornerLines(field.value);
    return areas.length === 0 ? [] : areas[areas.length - 1];
  }

  const store = document.getElementById('store-keep-out');
  if (store) {
    store.addEventListener('click', async () => {
      errorLine.hidden = true;
      const corners = lastArea();
      if (corners.length === 0) {
        showError(box.dataset.msgNoCorners);
        return;
      }
      try {
        await call('POST', url, { name: document.getElementById('keep-out-name').value, corners });
        const field = document.getElementById('keep-out');
        const lines = field.value.split('\n').map((line) => line.trim()).filter((line) => line !== '');
        field.value = lines.slice(0, -1).join('\n');
        status.textContent = box.dataset.msgStored;
        window.location.reload();
      } catch (e) {
        showError(e.message);
      }
    });
  }

  for (const button of box.querySelectorAll('.remove-keep-out')) {
    button.addEventListener('click', async () => {
      errorLine.hidden = true;
      try {
        await call('DELETE', url + '/' + button.dataset.keepOutId);
        window.location.reload();
      } catch (e) {
        showError(e.message);
      }
    });
  }
}
