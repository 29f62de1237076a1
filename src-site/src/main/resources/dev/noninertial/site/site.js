// noninertial frames documentation: our own small script, no libraries. It works from files
// opened offline. Three jobs: (1) syntax highlighting of Java code blocks, (2) a copy button on
// every code block, (3) the search page (index in search-index.js, written when the site is built).
(function () {
  "use strict";

  var KEYWORDS = ("abstract assert boolean break byte case catch char class const continue default do double " +
    "else enum extends final finally float for goto if implements import instanceof int interface long native " +
    "new package private protected public record return sealed short static strictfp super switch " +
    "synchronized this throw throws transient try var void volatile while yield true false null").split(" ");
  var KEYWORD = {};
  KEYWORDS.forEach(function (k) { KEYWORD[k] = true; });

  function escapeHtml(s) {
    return s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;");
  }

  // Splits Java source into tokens: comments, strings and chars, numbers, words, anything else.
  var TOKEN = /(\/\/[^\n]*|\/\*[\s\S]*?\*\/)|("""[\s\S]*?"""|"(?:[^"\\\n]|\\.)*"|'(?:[^'\\\n]|\\.)*')|(\b\d[\d_]*(?:\.[\d_]*)?(?:[eE][+-]?\d+)?[dDfFlL]?\b|\.\d[\d_]*(?:[eE][+-]?\d+)?[dDfF]?\b)|([A-Za-z_$][\w$]*)/g;

  function highlightJava(text) {
    var out = "", last = 0, m;
    TOKEN.lastIndex = 0;
    while ((m = TOKEN.exec(text)) !== null) {
      out += escapeHtml(text.slice(last, m.index));
      var t = escapeHtml(m[0]), cls = null;
      if (m[1]) { cls = "tok-com"; }
      else if (m[2]) { cls = "tok-str"; }
      else if (m[3]) { cls = "tok-num"; }
      else if (m[4]) {
        if (KEYWORD[m[4]]) { cls = "tok-kw"; }
        else if (/^[A-Z][A-Za-z0-9]*[a-z][A-Za-z0-9]*$/.test(m[4])) { cls = "tok-type"; }
      }
      out += cls ? '<span class="' + cls + '">' + t + "</span>" : t;
      last = m.index + m[0].length;
    }
    return out + escapeHtml(text.slice(last));
  }

  function copyText(text, button) {
    function done(ok) {
      button.textContent = ok ? "Copied" : "Select and copy";
      setTimeout(function () { button.textContent = "Copy"; }, 1600);
    }
    if (navigator.clipboard && navigator.clipboard.writeText) {
      navigator.clipboard.writeText(text).then(function () { done(true); }, function () { done(fallback(text)); });
    } else {
      done(fallback(text));
    }
  }

  function fallback(text) {
    var area = document.createElement("textarea");
    area.value = text;
    area.setAttribute("readonly", "");
    area.style.position = "absolute";
    area.style.left = "-9999px";
    document.body.appendChild(area);
    area.select();
    var ok = false;
    try { ok = document.execCommand("copy"); } catch (e) { ok = false; }
    document.body.removeChild(area);
    return ok;
  }

  function decorateCode() {
    var blocks = document.querySelectorAll("main pre > code");
    for (var i = 0; i < blocks.length; i++) {
      var code = blocks[i], pre = code.parentNode;
      var text = code.textContent;
      if (code.classList.contains("language-java") && !code.hasAttribute("data-highlighted")) {
        code.innerHTML = highlightJava(text);
        code.setAttribute("data-highlighted", "java");
      }
      if (pre.classList.contains("output") || pre.querySelector("button.copy")) {
        continue;
      }
      var button = document.createElement("button");
      button.type = "button";
      button.className = "copy";
      button.textContent = "Copy";
      button.setAttribute("aria-label", "Copy this code");
      button.addEventListener("click", (function (t, b) {
        return function () { copyText(t, b); };
      })(text, button));
      pre.appendChild(button);
    }
  }

  // ---- search ---------------------------------------------------------------------------------
  function words(s) {
    return s.toLowerCase().split(/[^a-z0-9_.]+/).filter(function (w) { return w.length > 0; });
  }

  // Score of one entry: every query word must occur (as a word start) in title or text.
  function score(entry, terms) {
    var title = entry.t.toLowerCase(), page = entry.p.toLowerCase(), text = entry.x.toLowerCase();
    var total = 0;
    for (var i = 0; i < terms.length; i++) {
      var w = terms[i], s = 0;
      var re = new RegExp("(^|[^a-z0-9])" + w.replace(/[.]/g, "\\."), "g");
      if (re.test(title)) { s += 10; }
      re.lastIndex = 0;
      if (re.test(page)) { s += 3; }
      re.lastIndex = 0;
      var hits = text.match(re);
      if (hits) { s += Math.min(hits.length, 5); }
      if (s === 0) { return 0; }
      total += s;
    }
    return total;
  }

  function excerpt(text, terms) {
    var lower = text.toLowerCase(), at = -1;
    for (var i = 0; i < terms.length && at < 0; i++) { at = lower.indexOf(terms[i]); }
    var start = Math.max(0, at - 80), end = Math.min(text.length, start + 220);
    var piece = (start > 0 ? "\u2026" : "") + text.slice(start, end) + (end < text.length ? "\u2026" : "");
    var html = escapeHtml(piece);
    terms.forEach(function (w) {
      var re = new RegExp("(" + escapeHtml(w).replace(/[.*+?^${}()|[\]\\]/g, "\\$&") + ")", "gi");
      html = html.replace(re, "<mark>$1</mark>");
    });
    return html;
  }

  function runSearch(query, target) {
    var index = window.FRAMES_SEARCH_INDEX || [];
    var terms = words(query);
    if (terms.length === 0) {
      target.innerHTML = '<p class="note">Type a word to search the guide (' + index.length + " sections).</p>";
      return;
    }
    var found = [];
    for (var i = 0; i < index.length; i++) {
      var s = score(index[i], terms);
      if (s > 0) { found.push({ e: index[i], s: s }); }
    }
    found.sort(function (a, b) { return b.s - a.s; });
    var html = '<p class="count">' + found.length + (found.length === 1 ? " section matches" : " sections match") +
      " <b>" + escapeHtml(query) + "</b>.</p>";
    if (found.length) {
      html += "<ol>";
      found.slice(0, 50).forEach(function (f) {
        html += '<li><a href="' + escapeHtml(f.e.u) + '">' + escapeHtml(f.e.t) + '</a> <span class="where">' +
          escapeHtml(f.e.p) + "</span><br>" + excerpt(f.e.x, terms) + "</li>";
      });
      html += "</ol>";
    }
    target.innerHTML = html;
  }

  function setUpSearch() {
    var target = document.getElementById("search-results");
    if (!target) { return; }
    var input = document.getElementById("search-page-input");
    var params = new URLSearchParams(window.location.search);
    var q = params.get("q") || "";
    var boxes = document.querySelectorAll('input[type="search"]');
    for (var i = 0; i < boxes.length; i++) { boxes[i].value = q; }
    runSearch(q, target);
    if (input) {
      input.addEventListener("input", function () { runSearch(input.value, target); });
      input.focus();
    }
  }

  function start() {
    decorateCode();
    setUpSearch();
  }

  if (document.readyState === "loading") {
    document.addEventListener("DOMContentLoaded", start);
  } else {
    start();
  }
})();
