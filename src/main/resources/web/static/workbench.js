// The workbench's few helpers; every page works without them.
'use strict';
document.addEventListener('DOMContentLoaded', function () {
  // Settings: apply a change as soon as the field is left (a select or box at once).
  document.querySelectorAll('form[data-autosubmit]').forEach(function (form) {
    form.addEventListener('change', function () {
      form.requestSubmit ? form.requestSubmit() : form.submit();
    });
  });
  // Upload: a file dropped on the box is put into its file field.
  document.querySelectorAll('[data-drop]').forEach(function (box) {
    var input = box.querySelector('input[type=file]');
    ['dragenter', 'dragover'].forEach(function (type) {
      box.addEventListener(type, function (e) { e.preventDefault(); box.classList.add('over'); });
    });
    ['dragleave', 'drop'].forEach(function (type) {
      box.addEventListener(type, function () { box.classList.remove('over'); });
    });
    box.addEventListener('drop', function (e) {
      e.preventDefault();
      if (e.dataTransfer && e.dataTransfer.files.length) {
        input.files = e.dataTransfer.files;
      }
    });
  });
});
