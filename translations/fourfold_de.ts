<?xml version="1.0" encoding="utf-8"?>
<!DOCTYPE TS>
<TS version="2.1" language="de">
<context>
    <name>fourfold::ArticleListModel</name>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="56"/>
        <source>Title</source>
        <translation>Titel</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="58"/>
        <source>Outlet</source>
        <translation>Medium</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="60"/>
        <source>Language</source>
        <translation>Sprache</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="62"/>
        <source>Characters</source>
        <translation>Zeichen</translation>
    </message>
</context>
<context>
    <name>fourfold::MainWindow</name>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="25"/>
        <source>intro</source>
        <translation>Einleitung</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="27"/>
        <source>body</source>
        <translation>Hauptteil</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="29"/>
        <source>conclusion</source>
        <translation>Schluss</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="40"/>
        <source>Fourfold</source>
        <translation>Fourfold</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="48"/>
        <source>Articles</source>
        <translation>Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="50"/>
        <source>Article text</source>
        <translation>Artikeltext</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="58"/>
        <source>&amp;Project</source>
        <translation>&amp;Projekt</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="59"/>
        <source>&amp;Open…</source>
        <translation>Ö&amp;ffnen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="61"/>
        <source>&amp;Quit</source>
        <translation>&amp;Beenden</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="65"/>
        <source>No project open.</source>
        <translation>Kein Projekt geöffnet.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="88"/>
        <source>%1 — Fourfold</source>
        <translation>%1 — Fourfold</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="90"/>
        <source>%1 articles · %2 coders · %3 annotations</source>
        <translation>%1 Artikel · %2 Codierende · %3 Annotationen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="127"/>
        <source>Open project</source>
        <translation>Projekt öffnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="127"/>
        <source>Fourfold projects (*.fourfold)</source>
        <translation>Fourfold-Projekte (*.fourfold)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="131"/>
        <source>Cannot open project</source>
        <translation>Projekt kann nicht geöffnet werden</translation>
    </message>
</context>
<context>
    <name>main</name>
    <message>
        <location filename="../app/desktop/main.cpp" line="25"/>
        <source>Fourfold: manual frame analysis of news and opinion articles.</source>
        <translation>Fourfold: manuelle Frame-Analyse von Nachrichten- und Meinungsartikeln.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main.cpp" line="29"/>
        <source>A project file to open (*.fourfold).</source>
        <translation>Eine zu öffnende Projektdatei (*.fourfold).</translation>
    </message>
    <message>
        <location filename="../app/desktop/main.cpp" line="36"/>
        <source>Cannot open project</source>
        <translation>Projekt kann nicht geöffnet werden</translation>
    </message>
</context>
</TS>
