// Review list on the plan page: selecting a row (click, or Enter or Space on the focused row) marks
// the matching edge, corner or facade band on the plan with the class "highlighted". Without this
// module the list and its forms work the same, only without the marking.

const HIGHLIGHT = 'highlighted';

function setUp(section) {
  const table = document.getElementById('review-list');
  const drawing = document.getElementById('plan-drawing');
  if (!table || !drawing) {
    return;
  }
  let selectedKey = null;

  function elementsFor(key) {
    return Array.from(drawing.querySelectorAll('[data-item-key]'))
      .filter((element) => element.getAttribute('data-item-key') === key);
  }

  function select(key) {
    drawing.querySelectorAll('.' + HIGHLIGHT).forEach((element) => element.classList.remove(HIGHLIGHT));
    table.querySelectorAll('tbody tr.selected').forEach((row) => {
      row.classList.remove('selected');
      row.setAttribute('aria-selected', 'false');
    });
    selectedKey = key === selectedKey ? null : key;
    if (selectedKey === null) {
      return;
    }
    const row = Array.from(table.querySelectorAll('tbody tr[data-item-key]'))
      .find((r) => r.dataset.itemKey === selectedKey);
    if (row) {
      row.classList.add('selected');
      row.setAttribute('aria-selected', 'true');
    }
    for (const element of elementsFor(selectedKey)) {
      element.classList.add(HIGHLIGHT);
      // the marked item is drawn last, so no other item covers it
      element.parentNode.appendChild(element);
    }
  }

  function rowOf(event) {
    if (event.target.closest('form, input, button, select, a')) {
      return null;
    }
    return event.target.closest('tbody tr[data-item-key]');
  }

  table.addEventListener('click', (event) => {
    const row = rowOf(event);
    if (row) {
      select(row.dataset.itemKey);
    }
  });
  table.addEventListener('keydown', (event) => {
    if (event.key !== 'Enter' && event.key !== ' ') {
      return;
    }
    const row = rowOf(event);
    if (row && event.target === row) {
      event.preventDefault();
      select(row.dataset.itemKey);
    }
  });

  // The plan editor replaces the drawing after a rod change; that is a new analysis, whose items
  // this list does not show yet.
  const stale = document.getElementById('review-stale');
  const warningsStale = document.getElementById('model-warnings-stale');
  new MutationObserver(() => {
    selectedKey = null;
    if (stale) {
      stale.textContent = section.dataset.msgStale;
      stale.hidden = false;
    }
    if (warningsStale) {
      warningsStale.hidden = false;
    }
  }).observe(drawing, { childList: true });
}

const section = document.getElementById('review');
if (section) {
  setUp(section);
}
