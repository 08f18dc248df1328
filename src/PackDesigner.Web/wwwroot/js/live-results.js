// Live results for the design editor: after a pause in typing, post the form to the page's Results handler and
// put the returned HTML fragment in place of the results panel. Without this script the Calculate button does the
// same with a full page load.
(function () {
    'use strict';
    var form = document.querySelector('form[data-live-results]');
    if (!form || !window.fetch || !window.FormData) {
        return;
    }

    var panel = document.getElementById(form.getAttribute('data-live-target'));
    var status = form.querySelector('[data-live-status]');
    var url = form.getAttribute('data-live-results');
    var timer = 0;
    var latest = 0;

    function say(text) {
        if (status) {
            status.textContent = text;
        }
    }

    // Once the design calculates again, the messages from the last full page load are out of date.
    function clearOldMessages() {
        document.querySelectorAll('main > [data-testid="error-summary"]').forEach(function (el) { el.remove(); });
        form.querySelectorAll('.field-error').forEach(function (el) { el.remove(); });
        form.querySelectorAll('.has-error').forEach(function (el) { el.classList.remove('has-error'); });
        form.querySelectorAll('[aria-invalid]').forEach(function (el) { el.removeAttribute('aria-invalid'); });
    }

    function refresh() {
        var mine = ++latest;
        panel.setAttribute('aria-busy', 'true');
        say('Calculating…');
        fetch(url, { method: 'POST', body: new FormData(form), credentials: 'same-origin', headers: { 'X-Requested-With': 'fetch' } })
            .then(function (response) {
                if (!response.ok) {
                    throw new Error(String(response.status));
                }
                return response.text();
            })
            .then(function (html) {
                if (mine !== latest) {
                    return;
                }
                panel.innerHTML = html;
                panel.removeAttribute('aria-busy');
                var valid = panel.querySelector('[data-valid="true"]') !== null;
                if (valid) {
                    clearOldMessages();
                }
                say(valid ? 'Results updated.' : 'Some values need correcting.');
            })
            .catch(function () {
                if (mine === latest) {
                    panel.removeAttribute('aria-busy');
                    say('Could not refresh the results; press Calculate.');
                }
            });
    }

    function schedule(event) {
        if (event.target && event.target.type === 'file') {
            return;
        }
        window.clearTimeout(timer);
        timer = window.setTimeout(refresh, 400);
    }

    form.addEventListener('input', schedule);
    form.addEventListener('change', schedule);
    form.setAttribute('data-live', 'on');
})();
